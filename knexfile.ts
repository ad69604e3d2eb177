import type { Knex } from 'knex';
import { join } from 'node:path';
import { loadConfig } from './server/config';
import { knexConfig } from './server/db';
import { readOrCreateSecrets } from './scripts/setup/local-secrets';

// The Knex command line (`npx knex migrate:make verb_object`, `migrate:list`…) reads this file.
// It works on the development database of `npm start`, with the same settings as the server.
const secrets = readOrCreateSecrets(join(__dirname, '.data', 'dev'));
const config = loadConfig({ DB_PASSWORD: secrets.dbPassword, SESSION_SECRET: secrets.sessionSecret, ...process.env });

const development: Knex.Config = {
  ...knexConfig(config.db),
  // New migrations are TypeScript from Knex's own stub: `up` and `down` with a type-only Knex import.
  migrations: { ...knexConfig(config.db).migrations, extension: 'ts' },
};

export default development;
