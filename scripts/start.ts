import { Server } from 'node:http';
import { join } from 'node:path';
import { Knex } from 'knex';
import pino from 'pino';
import { createApp } from '../server/app';
import { installProcessSafetyNet } from '../server/errors/process-safety-net';
import { loadConfig } from '../server/config';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../seeds/01_demo_coop_members';
import { ensureDatabaseAndUser, openMigratedDb, seed } from './setup/app-database';
import { LocalFakes, startLocalFakes } from './setup/local-fakes';
import { buildClientIfStale } from './setup/client-build';
import { readOrCreateSecrets } from './setup/local-secrets';
import { PrivateMariaDb, startPrivateMariaDb } from './setup/private-mariadb';
import { done, reportFailure, SetupError, step } from './setup/step-log';
import { ensureSystemPackages } from './setup/system-packages';

const root = join(__dirname, '..');
const home = join(root, '.data', 'dev');

function banner(url: string, fakes: LocalFakes): void {
  const demo = DEMO_MEMBERS.slice(0, 4).map((m) => `    ${m.email.padEnd(28)} ${m.roles.join(', ')}`);
  console.log(
    [
      '',
      `Commonwort is running at ${url}`,
      '',
      `  Demo sign-ins (password for all: ${DEMO_PASSWORD}):`,
      ...demo,
      '',
      `  Card payments run against a local Stripe fake (test mode); e-mails are caught, not delivered:`,
      `    read them at ${fakes.mail.apiUrl}/messages or on the Outbox page.`,
      '',
      '  Press Ctrl-C to stop (the database is shut down with it).',
      '',
    ].join('\n'),
  );
}

function listen(app: ReturnType<typeof createApp>['app'], port: number, host: string): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = app.listen(port, host, () => resolve(server));
    server.once('error', (error: NodeJS.ErrnoException) =>
      reject(error.code === 'EADDRINUSE' ? new SetupError(`Port ${port} is already in use.`, 'stop the other program or set PORT to a free port, e.g. `PORT=4310 npm start`.') : error),
    );
  });
}

async function main(): Promise<void> {
  let mariadb: PrivateMariaDb | undefined;
  let knex: Knex | undefined;
  let server: Server | undefined;
  let fakes: LocalFakes | undefined;
  let closeApp = () => {};
  const stop = async (code: number) => {
    server?.close();
    closeApp();
    await fakes?.stop();
    await knex?.destroy();
    mariadb?.stop();
    process.exit(code);
  };
  process.on('SIGINT', () => void stop(0));
  process.on('SIGTERM', () => void stop(0));
  try {
    ensureSystemPackages(['mariadb-server']);
    const secrets = readOrCreateSecrets(home);
    const dbPort = Number(process.env.DB_PORT ?? 3407);
    mariadb = await startPrivateMariaDb({ home, port: dbPort });
    fakes = await startLocalFakes();
    const config = loadConfig({ ...process.env, ...fakes.env, DB_PORT: String(mariadb.port), DB_PASSWORD: secrets.dbPassword, SESSION_SECRET: secrets.sessionSecret });
    ensureDatabaseAndUser(mariadb, config.db, false);
    knex = await openMigratedDb(config.db);
    await seed(knex);
    buildClientIfStale(root, config.clientDist);
    step('Starting the web server');
    const logger = pino({ level: config.logLevel });
    installProcessSafetyNet(logger);
    const created = createApp({ config, db: knex, logger, runScheduler: true });
    closeApp = created.close;
    server = await listen(created.app, config.port, config.host);
    done('Ready');
    banner(config.publicUrl, fakes);
  } catch (error) {
    await stop(reportFailure(error));
  }
}

void main();
