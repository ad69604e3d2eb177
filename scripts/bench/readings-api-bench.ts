// A batch with 10,000 readings loaded through the API (session, access check, paging query, JSON),
// timed against a bare query of the same rows on the same database, in the same run.
import { Server } from 'node:http';
import { join } from 'node:path';
import { Knex } from 'knex';
import { createApp } from '../../server/app';
import { loadConfig } from '../../server/config';
import { ensureDatabaseAndUser, openMigratedDb } from '../setup/app-database';
import { freePort } from '../setup/free-port';
import { readOrCreateSecrets } from '../setup/local-secrets';
import { startPrivateMariaDb } from '../setup/private-mariadb';
import { createUser } from '../../test/integration/helpers/user-factory';

const READINGS = 10_000;
const ROUNDS = 7;

async function seedBatch(db: Knex, userId: number): Promise<number> {
  const [batchId] = await db('batches').insert({ name: 'Bench batch', brewer_user_id: userId, created_by_user_id: userId, brew_date: new Date('2026-11-01'), planned_volume_litres: 20 });
  const start = Date.UTC(2026, 10, 1);
  const rows = Array.from({ length: READINGS }, (_, i) => ({
    batch_id: batchId, measured_at: new Date(start + i * 5 * 60_000), instrument: 'logger' as const, raw_value: (1.05 - i * 0.000003).toFixed(4),
    raw_unit: 'sg' as const, sample_temperature_c: '19.0', corrected_sg: (1.05 - i * 0.000003).toFixed(5), source: 'push' as const, note: '',
  }));
  for (let i = 0; i < rows.length; i += 1000) await db('gravity_readings').insert(rows.slice(i, i + 1000));
  return batchId;
}

async function signIn(base: string, email: string, password: string): Promise<Record<string, string>> {
  const probe = await fetch(`${base}/api/auth/session`);
  const cookies = new Map<string, string>();
  const keep = (res: Response) => res.headers.getSetCookie().forEach((c) => { const [pair] = c.split(';'); const at = pair.indexOf('='); cookies.set(pair.slice(0, at), pair.slice(at + 1)); });
  keep(probe);
  const header = () => [...cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: header(), 'x-xsrf-token': decodeURIComponent(cookies.get('XSRF-TOKEN') ?? '') },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`bench sign-in failed: ${res.status}`);
  keep(res);
  return { cookie: header() };
}

async function best(run: () => Promise<void>): Promise<number> {
  let fastest = Infinity;
  for (let i = 0; i < ROUNDS; i++) {
    const t0 = process.hrtime.bigint();
    await run();
    fastest = Math.min(fastest, Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return fastest;
}

/** Starts a private MariaDB in .data/bench, measures, prints one line, and stops it. */
export async function benchReadingsApi(root: string): Promise<void> {
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
    const user = await createUser(db, ['member']);
    const batchId = await seedBatch(db, user.id);
    const created = createApp({ config, db, sessionCleanupMs: 0 });
    close = created.close;
    const port = await freePort();
    server = await new Promise<Server>((resolve) => { const s = created.app.listen(port, '127.0.0.1', () => resolve(s)); });
    const base = `http://127.0.0.1:${port}`;
    const headers = await signIn(base, user.email, user.password);
    const url = `${base}/api/batches/${batchId}/readings?limit=${READINGS}&sort=measuredAt&direction=asc`;
    const viaApi = async () => {
      const body = (await (await fetch(url, { headers })).json()) as { items: unknown[] };
      if (body.items.length !== READINGS) throw new Error(`the API returned ${body.items.length} readings`);
    };
    const bare = async () => {
      const rows = await db!('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at').limit(READINGS);
      if (rows.length !== READINGS) throw new Error('the bare query missed rows');
    };
    await viaApi();
    await bare();
    const [api, query] = [await best(viaApi), await best(bare)];
    const ratio = api / query;
    process.stdout.write(`\nGravity log: ${READINGS.toLocaleString('en')} readings of one batch (best of ${ROUNDS})\n`);
    process.stdout.write(`bare query ${query.toFixed(1)} ms · through the API ${api.toFixed(1)} ms · ratio ${ratio.toFixed(2)} × (goal ≤ 2×: ${ratio <= 2 ? 'met' : 'NOT met'})\n`);
  } finally {
    if (server) await new Promise((resolve) => server!.close(resolve));
    close();
    await db?.destroy();
    mariadb.stop();
  }
}
