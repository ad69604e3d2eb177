import { spawn, spawnSync } from 'node:child_process';
import { mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { Knex } from 'knex';
import { loadConfig } from '../server/config';
import { ensureDatabaseAndUser, openMigratedDb, seed } from './setup/app-database';
import { buildClientIfStale } from './setup/client-build';
import { freePort } from './setup/free-port';
import { LocalFakes, startLocalFakes } from './setup/local-fakes';
import { readOrCreateSecrets } from './setup/local-secrets';
import { PrivateMariaDb, startPrivateMariaDb } from './setup/private-mariadb';
import { reportFailure, step } from './setup/step-log';
import { ensureSystemPackages } from './setup/system-packages';

const root = join(__dirname, '..');
const home = join(root, '.data', 'test');
const report = join(root, 'test-results', 'jest.json');
const E2E_DATABASE = 'commonwort_e2e';
const DEMO_DATABASE = 'commonwort_demo';

async function runJestAsync(env: NodeJS.ProcessEnv, extraArgs: string[]): Promise<number> {
  step('Running every test: shared, server, client, integration (real MariaDB) and end-to-end (Chromium)');
  mkdirSync(join(root, 'test-results'), { recursive: true });
  rmSync(report, { force: true });
  const args = ['--maxWorkers=2', '--json', `--outputFile=${report}`, ...(process.env.CI ? ['--ci'] : []), ...extraArgs];
  const jest = spawn(join(root, 'node_modules', '.bin', 'jest'), args, { cwd: root, stdio: 'inherit', env });
  const status = await new Promise<number | null>((resolve) => jest.once('exit', (code) => resolve(code)));
  spawnSync(process.execPath, [join(__dirname, 'print-test-summary.mjs'), report], { stdio: 'inherit' });
  return status ?? 1;
}

async function main(): Promise<number> {
  let mariadb: PrivateMariaDb | undefined;
  let knex: Knex | undefined;
  let fakes: LocalFakes | undefined;
  try {
    ensureSystemPackages(['mariadb-server', 'chromium']);
    const secrets = readOrCreateSecrets(home);
    // A free port unless one is asked for, so two checkouts can test at the same time.
    const dbPort = process.env.TEST_DB_PORT ? Number(process.env.TEST_DB_PORT) : await freePort();
    mariadb = await startPrivateMariaDb({ home, port: dbPort });
    fakes = await startLocalFakes();
    const env = {
      ...process.env,
      ...fakes.env,
      NODE_ENV: 'test',
      DB_PORT: String(mariadb.port),
      DB_NAME: 'commonwort_test',
      E2E_DB_NAME: E2E_DATABASE,
      DEMO_DB_NAME: DEMO_DATABASE,
      DB_USER: 'commonwort_test',
      DB_PASSWORD: secrets.dbPassword,
      SESSION_SECRET: secrets.sessionSecret,
      BCRYPT_COST: '4',
      LOG_LEVEL: 'silent',
      CHROMIUM_PATH: '/usr/bin/chromium',
    };
    const config = loadConfig(env);
    const jestArgs = process.argv.slice(2);
    const runs = (project: string) => !jestArgs.includes('--selectProjects') || jestArgs.includes(project);
    const withBrowser = runs('e2e');
    // The browser journeys get a database of their own: pages list what is stored, and the many
    // rows the integration specs write meanwhile would only slow them and move their layout.
    const e2eDb = { ...config.db, database: E2E_DATABASE };
    for (const db of withBrowser ? [config.db, e2eDb] : [config.db]) {
      ensureDatabaseAndUser(mariadb, db, true);
      knex = await openMigratedDb(db);
      await knex.destroy();
      knex = undefined;
    }
    if (runs('integration')) {
      // The demo co-op, seeded exactly as `npm start` seeds it, for the spec that checks the seeds.
      const demoDb = { ...config.db, database: DEMO_DATABASE };
      ensureDatabaseAndUser(mariadb, demoDb, true);
      knex = await openMigratedDb(demoDb);
      await seed(knex);
      await knex.destroy();
      knex = undefined;
    }
    // A run limited to some projects needs the built app only when it includes the browser tests.
    if (withBrowser) buildClientIfStale(root, config.clientDist);
    // Jest runs in a child process while the fakes keep answering from this one.
    return await runJestAsync(env, jestArgs);
  } catch (error) {
    return reportFailure(error);
  } finally {
    await knex?.destroy();
    await fakes?.stop();
    mariadb?.stop();
  }
}

void main().then((code) => process.exit(code));
