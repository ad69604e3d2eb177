import { join } from 'node:path';
import { loadConfig } from '../server/config';
import { createDb, knexConfig } from '../server/db';
import { readOrCreateSecrets } from './setup/local-secrets';
import { migrate, seed } from './setup/app-database';
import { reportFailure, step } from './setup/step-log';

/** `npm run db:migrate|db:rollback|db:seed` against the development database (start it with `npm start`). */
async function main(command: string): Promise<number> {
  const secrets = readOrCreateSecrets(join(__dirname, '..', '.data', 'dev'));
  const config = loadConfig({ DB_PASSWORD: secrets.dbPassword, SESSION_SECRET: secrets.sessionSecret, ...process.env });
  const knex = createDb(config.db);
  try {
    if (command === 'migrate') await migrate(knex);
    else if (command === 'seed') await seed(knex);
    else if (command === 'rollback') {
      step('Rolling back the last batch of migrations');
      const [, undone] = await knex.migrate.rollback(knexConfig(config.db).migrations);
      console.log(undone.length ? undone.join('\n') : 'Nothing to roll back');
    } else throw new Error(`Unknown command "${command}": use migrate, rollback or seed.`);
    return 0;
  } catch (error) {
    return reportFailure(error);
  } finally {
    await knex.destroy();
  }
}

void main(process.argv[2] ?? '').then((code) => process.exit(code));
