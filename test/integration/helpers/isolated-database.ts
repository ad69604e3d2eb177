import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Knex } from 'knex';
import { Config } from '@server/config';
import { ensureDatabaseAndUser, openMigratedDb } from '../../../scripts/setup/app-database';
import { freePort } from '../../../scripts/setup/free-port';
import { PrivateMariaDb, startPrivateMariaDb } from '../../../scripts/setup/private-mariadb';
import { testConfig } from './test-app';

/** A private MariaDB of one spec file (its own data folder and port), which the spec may kill and restart. */
export interface IsolatedDatabase {
  config: Config;
  /** Knex on it; the spec owns `destroy()`. */
  knex: Knex;
  /** Kills the server at once (SIGKILL, as a crash or an OOM kill would). */
  kill(): Promise<void>;
  /** Starts it again on the same port and data. */
  restart(): Promise<void>;
  stop(): void;
}

const root = join(__dirname, '..', '..', '..');

function serverPid(home: string): number | null {
  const file = join(home, 'mysqld.pid');
  return existsSync(file) ? Number(readFileSync(file, 'utf8').trim()) : null;
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Runs set-up steps without their console lines (they would fill the test report). */
async function quietly<T>(work: () => Promise<T>): Promise<T> {
  const log = jest.spyOn(console, 'log').mockImplementation(() => {});
  try {
    return await work();
  } finally {
    log.mockRestore();
  }
}

/** Starts (or reuses) `.data/<name>`, with a fresh migrated database holding no people. */
export async function startIsolatedDatabase(name: string): Promise<IsolatedDatabase> {
  const home = join(root, '.data', name);
  const port = await freePort();
  let server: PrivateMariaDb = await quietly(() => startPrivateMariaDb({ home, port }));
  const base = testConfig();
  const config: Config = { ...base, db: { ...base.db, port: server.port, database: 'commonwort_isolated' } };
  const knex = await quietly(async () => {
    ensureDatabaseAndUser(server, config.db, true);
    return openMigratedDb(config.db);
  });
  return {
    config,
    knex,
    async kill() {
      const pid = serverPid(home);
      if (!pid) throw new Error(`No MariaDB pid in ${home}`);
      process.kill(pid, 'SIGKILL');
      while (alive(pid)) await new Promise((resolve) => setTimeout(resolve, 20));
    },
    async restart() {
      server = await quietly(() => startPrivateMariaDb({ home, port: server.port }));
    },
    stop() {
      void quietly(async () => server.stop());
    },
  };
}
