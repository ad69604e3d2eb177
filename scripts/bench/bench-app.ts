// The private app that API benches measure against: its own MariaDB in .data/bench, the real app on
// a free port, a signed-in session, and a best-of timer.
import { Server } from 'node:http';
import { join } from 'node:path';
import { Knex } from 'knex';
import { createApp } from '../../server/app';
import { Config, loadConfig } from '../../server/config';
import { ensureDatabaseAndUser, openMigratedDb } from '../setup/app-database';
import { freePort } from '../setup/free-port';
import { readOrCreateSecrets } from '../setup/local-secrets';
import { startPrivateMariaDb } from '../setup/private-mariadb';

/** What a bench gets: the migrated database, its config and the app's base URL. */
export interface BenchApp {
  db: Knex;
  config: Config;
  base: string;
}

/** Starts MariaDB and the app, runs `bench`, and stops both whatever happens. */
export async function withBenchApp(root: string, bench: (app: BenchApp) => Promise<void>): Promise<void> {
  const home = join(root, '.data', 'bench');
  const secrets = readOrCreateSecrets(home);
  const mariadb = await startPrivateMariaDb({ home, port: await freePort() });
  let db: Knex | undefined;
  let server: Server | undefined;
  let close = () => undefined as void;
  try {
    const config = loadConfig({ ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'silent', BCRYPT_COST: '4', DB_PORT: String(mariadb.port), DB_NAME: 'commonwort_bench', DB_USER: 'commonwort_bench', DB_PASSWORD: secrets.dbPassword, SESSION_SECRET: secrets.sessionSecret });
    ensureDatabaseAndUser(mariadb, config.db, true);
    db = await openMigratedDb(config.db);
    const created = createApp({ config, db, sessionCleanupMs: 0 });
    close = created.close;
    const port = await freePort();
    server = await new Promise<Server>((resolve) => { const s = created.app.listen(port, '127.0.0.1', () => resolve(s)); });
    await bench({ db, config, base: `http://127.0.0.1:${port}` });
  } finally {
    if (server) await new Promise((resolve) => server!.close(resolve));
    close();
    await db?.destroy();
    mariadb.stop();
  }
}

/** Signs in and returns the headers a request of that session sends (cookies and the CSRF header). */
export async function benchSignIn(base: string, email: string, password: string): Promise<Record<string, string>> {
  const cookies = new Map<string, string>();
  const keep = (res: Response) => res.headers.getSetCookie().forEach((c) => { const [pair] = c.split(';'); const at = pair.indexOf('='); cookies.set(pair.slice(0, at), pair.slice(at + 1)); });
  const header = () => [...cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  const xsrf = () => decodeURIComponent(cookies.get('XSRF-TOKEN') ?? '');
  keep(await fetch(`${base}/api/auth/session`));
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: header(), 'x-xsrf-token': xsrf() },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status}`);
  keep(res);
  return { cookie: header(), 'x-xsrf-token': xsrf() };
}

/** The fastest of `rounds` runs in ms: the machine is shared, and the fastest is the least disturbed. */
export async function bestOf(rounds: number, run: () => Promise<void>): Promise<number> {
  let fastest = Infinity;
  for (let i = 0; i < rounds; i++) {
    const t0 = process.hrtime.bigint();
    await run();
    fastest = Math.min(fastest, Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return fastest;
}

/** The fastest of `rounds` runs of each case, the cases taking turns so a busy spell on the shared machine hits them alike. */
export async function bestOfEach(rounds: number, runs: (() => Promise<void>)[]): Promise<number[]> {
  const fastest = runs.map(() => Infinity);
  for (let i = 0; i < rounds; i++) {
    for (const [k, run] of runs.entries()) {
      const t0 = process.hrtime.bigint();
      await run();
      fastest[k] = Math.min(fastest[k], Number(process.hrtime.bigint() - t0) / 1e6);
    }
  }
  return fastest;
}
