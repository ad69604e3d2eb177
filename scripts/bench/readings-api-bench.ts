// A batch with 10,000 readings loaded through the API (session, access check, paging query, JSON),
// timed against a bare query of the same rows on the same database, in the same run.
import { Knex } from 'knex';
import { ReadingPage, readingsFromColumns } from '@shared/readings';
import { createUser } from '../../test/integration/helpers/user-factory';
import { benchSignIn, bestOfEach, withBenchApp } from './bench-app';

const READINGS = 10_000;
const ROUNDS = 15;

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

/** Starts a private MariaDB in .data/bench, measures, prints one line, and stops it. */
export async function benchReadingsApi(root: string): Promise<void> {
  await withBenchApp(root, async ({ db, base }) => {
    const user = await createUser(db, ['member']);
    const batchId = await seedBatch(db, user.id);
    const headers = await benchSignIn(base, user.email, user.password);
    const url = `${base}/api/batches/${batchId}/readings?limit=${READINGS}&sort=measuredAt&direction=asc`;
    // The response fetched and parsed, as any caller of the API gets it.
    const viaApi = async () => {
      const page = (await (await fetch(url, { headers })).json()) as ReadingPage;
      if (page.columns.id.length !== READINGS) throw new Error(`the API returned ${page.columns.id.length} readings`);
    };
    // The same, then turned into one object per reading as the gravity log's table takes them (a page there is ≤ 100 rows).
    const viaApiAsRows = async () => {
      const page = (await (await fetch(url, { headers })).json()) as ReadingPage;
      if (readingsFromColumns(page.batchId, page.columns).length !== READINGS) throw new Error('the rows did not come back');
    };
    const bare = async () => {
      const rows = await db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at').limit(READINGS);
      if (rows.length !== READINGS) throw new Error('the bare query missed rows');
    };
    await viaApi();
    await bare();
    const [api, asRows, query] = await bestOfEach(ROUNDS, [viaApi, viaApiAsRows, bare]);
    const ratio = api / query;
    process.stdout.write(`\nGravity log: ${READINGS.toLocaleString('en')} readings of one batch (best of ${ROUNDS}, cases interleaved)\n`);
    process.stdout.write(`bare query ${query.toFixed(1)} ms · through the API ${api.toFixed(1)} ms · ratio ${ratio.toFixed(2)} × (goal ≤ 2×: ${ratio <= 2 ? 'met' : 'NOT met'})\n`);
    process.stdout.write(`the API's page turned into ${READINGS.toLocaleString('en')} row objects in the client: ${asRows.toFixed(1)} ms · ratio ${(asRows / query).toFixed(2)} ×\n`);
  });
}
