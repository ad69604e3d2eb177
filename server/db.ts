import knex, { Knex } from 'knex';
import { join } from 'node:path';
import { Config } from './config';

// The row types of every table and their part of Knex's `Tables` augmentation, one file per feature.
export * from './db-tables/people.tables';
export * from './db-tables/recipes.tables';
export * from './db-tables/kit-room.tables';
export * from './db-tables/dues.tables';
export * from './db-tables/outbox-and-jobs.tables';
export * from './db-tables/batches.tables';
export * from './db-tables/readings.tables';
export * from './db-tables/lab.tables';
export * from './db-tables/stock.tables';

export const MIGRATIONS_DIR = join(__dirname, '..', 'migrations');
export const SEEDS_DIR = join(__dirname, '..', 'seeds');

/** Knex settings for the configured database. */
export function knexConfig(db: Config['db']): Knex.Config {
  return {
    client: 'mysql2',
    connection: { ...db, charset: 'utf8mb4', timezone: 'Z', dateStrings: false },
    pool: { min: 0, max: 10 },
    // While the database is down a request waits at most this long for a connection, then gets a 503.
    acquireConnectionTimeout: 10_000,
    migrations: { directory: MIGRATIONS_DIR, loadExtensions: ['.ts'], tableName: 'knex_migrations' },
    seeds: { directory: SEEDS_DIR, loadExtensions: ['.ts'] },
  };
}

/** Opens the connection pool; callers own `destroy()`. */
export function createDb(db: Config['db']): Knex {
  return knex(knexConfig(db));
}
