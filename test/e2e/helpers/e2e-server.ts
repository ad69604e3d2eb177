import { Server as HttpServer } from 'node:http';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Knex } from 'knex';
import { createApp, CreatedApp } from '@server/app';
import { loadConfig } from '@server/config';
import { createDb } from '@server/db';
import { freePort } from '../../../scripts/setup/free-port';

/** The real server with the built app, on a free loopback port, against the browser tests' database. */
export interface E2eServer {
  baseUrl: string;
  db: Knex;
  /** The scheduled work (outbox sweep, renewals), run on demand by the specs. */
  jobs: CreatedApp['jobs'];
  stop(): Promise<void>;
}

export async function startE2eServer(): Promise<E2eServer> {
  if (!process.env.DB_PASSWORD) throw new Error('End-to-end tests need the test database and the built app: run them with `npm test`.');
  const port = await freePort();
  // The browser tests' own database (made by `npm test`), apart from the integration specs' rows.
  const config = loadConfig({ ...process.env, DB_NAME: process.env.E2E_DB_NAME ?? process.env.DB_NAME, PORT: String(port), HOST: '127.0.0.1' });
  if (!existsSync(join(config.clientDist, 'index.html'))) throw new Error(`No built app in ${config.clientDist}: run them with \`npm test\`, which builds it.`);
  const db = createDb(config.db);
  // Browser journeys all come from 127.0.0.1 and share the database's counters: a loose address limit.
  const signInLimits = { perAccountAndAddress: 5, windowSeconds: 900, perAddress: 10_000, addressWindowSeconds: 60 };
  const { app, close, jobs } = createApp({ config, db, sessionCleanupMs: 0, signInLimits, publicRequestLimit: { points: 10_000, windowSeconds: 60 } });
  const server: HttpServer = await new Promise((resolve) => {
    const s = app.listen(port, '127.0.0.1', () => resolve(s));
  });
  return {
    baseUrl: config.publicUrl,
    db,
    jobs,
    async stop() {
      await new Promise((resolve) => server.close(resolve));
      server.closeAllConnections();
      close();
      await db.destroy();
    },
  };
}
