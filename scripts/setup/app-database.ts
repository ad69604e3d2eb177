import { Knex } from 'knex';
import { createDb, knexConfig } from '../../server/db';
import { Config } from '../../server/config';
import { PrivateMariaDb } from './private-mariadb';
import { done, SetupError, step } from './step-log';

/** Creates the application's database and user on the private server (dropping the database first when `fresh`). */
export function ensureDatabaseAndUser(server: PrivateMariaDb, db: Config['db'], fresh: boolean): void {
  step(`${fresh ? 'Creating a fresh' : 'Checking the'} database "${db.database}" and its user`);
  server.runSql(
    [
      fresh ? `DROP DATABASE IF EXISTS \`${db.database}\`;` : '',
      `CREATE DATABASE IF NOT EXISTS \`${db.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
      `CREATE USER IF NOT EXISTS '${db.user}'@'127.0.0.1' IDENTIFIED BY '${db.password}';`,
      `ALTER USER '${db.user}'@'127.0.0.1' IDENTIFIED BY '${db.password}';`,
      `GRANT ALL PRIVILEGES ON \`${db.database}\`.* TO '${db.user}'@'127.0.0.1';`,
    ].join('\n'),
  );
}

/** Applies pending migrations; prints which ones ran. */
export async function migrate(knex: Knex): Promise<void> {
  step('Applying database migrations');
  try {
    const [, applied] = await knex.migrate.latest(knexConfig({} as Config['db']).migrations);
    done(applied.length ? `Applied ${applied.length} migration(s)` : 'Database schema is up to date');
  } catch (error) {
    throw new SetupError(`A migration failed: ${(error as Error).message}`, 'fix the migration named above; never edit one that was already applied.');
  }
}

/** Runs the seeds (each one decides itself whether there is anything to add). */
export async function seed(knex: Knex): Promise<void> {
  step('Seeding the demo co-op (kept as it is when it already has people)');
  await knex.seed.run(knexConfig({} as Config['db']).seeds);
}

/** Opens Knex on the database, migrated. */
export async function openMigratedDb(db: Config['db']): Promise<Knex> {
  const knex = createDb(db);
  await migrate(knex);
  return knex;
}
