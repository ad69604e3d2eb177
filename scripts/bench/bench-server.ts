import { Server } from 'node:http';
import { join } from 'node:path';
import express from 'express';
import { Knex } from 'knex';
import { createApp, CreatedApp } from '../../server/app';
import { Config, loadConfig } from '../../server/config';
import { createRecipesService } from '../../server/recipes';
import { usersRepository } from '../../server/users/users.repository';
import { SessionUser } from '@shared/auth';
import { createCatalogueEntries, sampleDesign } from '../../test/integration/helpers/catalogue-factory';
import { ensureDatabaseAndUser, openMigratedDb } from '../setup/app-database';
import { freePort } from '../setup/free-port';
import { readOrCreateSecrets } from '../setup/local-secrets';
import { PrivateMariaDb, startPrivateMariaDb } from '../setup/private-mariadb';

const root = join(__dirname, '..', '..');
const home = join(root, '.data', 'bench');
export const BENCH_PASSWORD = 'bench password never used elsewhere';

/** The bench's own database, app and a bare route, ready to be measured. */
export interface BenchServers {
  appUrl: string;
  bareUrl: string;
  user: SessionUser;
  stop(): Promise<void>;
}

function listen(app: express.Express, port: number): Promise<Server> {
  return new Promise((resolve) => {
    const server = app.listen(port, '127.0.0.1', () => resolve(server));
  });
}

/** A member with 20 recipes, so the list has real rows to read. */
async function seedMember(db: Knex, config: Config): Promise<SessionUser> {
  const bcrypt = await import('bcryptjs');
  const email = `bench-${Date.now()}@bench.example`;
  const id = await usersRepository.create(db, { email, name: 'Bench member (invented)', passwordHash: await bcrypt.hash(BENCH_PASSWORD, config.bcryptCost), roles: ['member'] });
  const user = { id, email, name: 'Bench member (invented)', roles: ['member' as const] };
  const recipes = createRecipesService(db);
  const ids = await createCatalogueEntries(db);
  for (let i = 0; i < 20; i++) await recipes.create(user, { ...sampleDesign(ids), name: `Bench recipe ${i}` }, 'private');
  return user;
}

/** Starts `.data/bench`'s MariaDB, the full app and a bare Express route doing the same recipe-list query without sessions. */
export async function startBenchServers(): Promise<BenchServers> {
  const secrets = readOrCreateSecrets(home);
  const mariadb: PrivateMariaDb = await startPrivateMariaDb({ home, port: await freePort() });
  const config = loadConfig({ DB_PORT: String(mariadb.port), DB_NAME: 'commonwort_bench', DB_USER: 'commonwort_bench', DB_PASSWORD: secrets.dbPassword, SESSION_SECRET: secrets.sessionSecret, BCRYPT_COST: '10', LOG_LEVEL: 'silent', NODE_ENV: 'production' });
  ensureDatabaseAndUser(mariadb, config.db, true);
  const db = await openMigratedDb(config.db);
  const user = await seedMember(db, config);
  // Generous caps: the bench measures throughput, not the limits.
  const created: CreatedApp = createApp({ config, db, sessionCleanupMs: 0, signInLimits: { perAccountAndAddress: 1000, windowSeconds: 60, perAddress: 1e6, addressWindowSeconds: 60 }, publicRequestLimit: { points: 1e6, windowSeconds: 60 } });
  const bare = express();
  const recipes = createRecipesService(db);
  bare.get('/bare/recipes', async (_req, res) => {
    res.json(await recipes.list(user, false));
  });
  const [appServer, bareServer] = await Promise.all([listen(created.app, await freePort()), listen(bare, await freePort())]);
  const url = (server: Server) => `http://127.0.0.1:${(server.address() as { port: number }).port}`;
  return {
    appUrl: url(appServer),
    bareUrl: url(bareServer),
    user,
    async stop() {
      for (const server of [appServer, bareServer]) {
        server.closeAllConnections();
        await new Promise((resolve) => server.close(resolve));
      }
      created.close();
      // Let requests the load generator left in flight finish before the pool goes.
      await new Promise((resolve) => setTimeout(resolve, 1000));
      await db.destroy();
      mariadb.stop();
    },
  };
}
