import { ReadingPage, readingsFromColumns } from '@shared/readings';
import { ApiClient } from './helpers/api-client';
import { startBatch } from './helpers/batch-factory';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';
import { CSRF_HEADER } from '@server/auth';

// Four good rows (one in the co-op's local time) and two bad ones, on lines 3 and 5.
const MIXED = [
  'time,instrument,value,unit,temperature_c',
  '2026-11-21T08:00:00Z,hydrometer,1.050,sg,20',
  '2026-11-21T20:00:00Z,hydrometer,abc,sg,20',
  '2026-11-22 09:00,logger,1.030,sg,19',
  '2026-11-22T10:00:00Z,hydrometer,1.040,brix,20',
  '2026-11-23T08:00:00Z,refractometer,9.5,brix,',
  '2026-11-24T08:00:00Z,density-meter,1015.2,kg/m3,20',
].join('\n');

describe('Readings import and export API', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp()));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  async function ownBatch() {
    const client = await ApiClient.signedIn(t.app, await createUser(t.db));
    return { client, batch: await startBatch(client) };
  }

  /** Multipart upload with the client's cookies and CSRF token. */
  async function upload(client: ApiClient, batchId: number, file: { name: string; type: string; body: Buffer | string }, mode: string) {
    const token = (await client.get('/api/auth/session')).headers['set-cookie'];
    const csrf = decodeURIComponent(String(token).match(/XSRF-TOKEN=([^;]+)/)![1]);
    return client.agent
      .post(`/api/batches/${batchId}/readings/import`)
      .set(CSRF_HEADER, csrf)
      .field('mode', mode)
      .attach('file', Buffer.isBuffer(file.body) ? file.body : Buffer.from(file.body), { filename: file.name, contentType: file.type });
  }
  const csv = (body: string) => ({ name: 'log.csv', type: 'text/csv', body });
  const stored = (batchId: number) => t.db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at');

  it('when a file with bad lines is imported all-or-nothing, then nothing is stored and each bad line is reported', async () => {
    const { client, batch } = await ownBatch();
    const res = await upload(client, batch.id, csv(MIXED), 'all-or-nothing');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ imported: 0, notImported: 4, rowsTotal: 6 });
    expect(res.body.problems.map((p: { line: number }) => p.line)).toEqual([3, 5]);
    expect(res.body.problems[0].reason).toMatch(/value.*not a number/);
    expect(res.body.problems[1].reason).toMatch(/rawUnit/);
    expect(await stored(batch.id)).toHaveLength(0);
  });

  it('when good rows only are imported, then exactly those are stored with their source, and a re-import doubles nothing', async () => {
    const { client, batch } = await ownBatch();
    const res = await upload(client, batch.id, csv(MIXED), 'good-rows-only');
    expect(res.body).toMatchObject({ imported: 4, notImported: 0 });
    const rows = await stored(batch.id);
    expect(rows.map((r) => Number(r.raw_value))).toEqual([1.05, 1.03, 9.5, 1015.2]);
    expect(rows.every((r) => r.source === 'file' && r.upload_id !== null)).toBe(true);
    // "2026-11-22 09:00" is wall-clock time in the co-op's zone (Europe/Berlin by default: UTC+1 in November).
    expect(rows[1].measured_at.toISOString()).toBe(t.config.coopTimeZone === 'Europe/Berlin' ? '2026-11-22T08:00:00.000Z' : rows[1].measured_at.toISOString());
    const again = await upload(client, batch.id, csv(MIXED), 'good-rows-only');
    expect(again.body.imported).toBe(0);
    expect(again.body.duplicates.map((d: { line: number }) => d.line)).toEqual([2, 4, 6, 7]);
    expect(await stored(batch.id)).toHaveLength(4);
    const list: ReadingPage = (await client.get(`/api/batches/${batch.id}/readings?limit=10`)).body;
    expect(readingsFromColumns(list.batchId, list.columns)[0].sourceDetail).toBe('log.csv');
  });

  it('when the file repeats a time and instrument, then the repeat is reported as a duplicate of its first line', async () => {
    const { client, batch } = await ownBatch();
    const res = await upload(client, batch.id, csv('time,instrument,value,unit\n2026-11-21T08:00:00Z,logger,1.05,sg\n2026-11-21T08:00:00Z,logger,1.049,sg\n'), 'good-rows-only');
    expect(res.body.imported).toBe(1);
    expect(res.body.duplicates).toEqual([{ line: 3, reason: 'repeats line 2 (same time and instrument)' }]);
  });

  it('when the file is too large, then it answers 413; when it is not CSV, 415; nothing is stored', async () => {
    const { client, batch } = await ownBatch();
    const big = 'time,instrument,value,unit\n' + '2026-11-21T08:00:00Z,logger,1.05,sg\n'.repeat(160_000);
    expect((await upload(client, batch.id, csv(big), 'good-rows-only')).status).toBe(413);
    expect((await upload(client, batch.id, { name: 'log.xlsx', type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', body: Buffer.from([80, 75, 3, 4, 0]) }, 'good-rows-only')).status).toBe(415);
    expect((await upload(client, batch.id, { name: 'photo.png', type: 'image/png', body: 'x' }, 'good-rows-only')).status).toBe(415);
    expect(await stored(batch.id)).toHaveLength(0);
  });

  it('when a file maps its own columns, then the mapping is used with a fixed instrument and unit', async () => {
    const { client, batch } = await ownBatch();
    const token = decodeURIComponent(String((await client.get('/api/auth/session')).headers['set-cookie']).match(/XSRF-TOKEN=([^;]+)/)![1]);
    const columns = { time: 'Timestamp', value: 'Gravity', temperature: 'Temp', instrument: null, unit: null, fixedInstrument: 'logger', fixedUnit: 'plato' };
    const res = await client.agent
      .post(`/api/batches/${batch.id}/readings/import`)
      .set(CSRF_HEADER, token)
      .field('mode', 'all-or-nothing')
      .field('columns', JSON.stringify(columns))
      .attach('file', Buffer.from('Timestamp,Gravity,Temp\n2026-11-21T08:00:00Z,12.0,18.5\n'), { filename: 'device.csv', contentType: 'text/csv' });
    expect(res.body).toMatchObject({ imported: 1, problems: [] });
    expect((await stored(batch.id))[0]).toMatchObject({ instrument: 'logger', raw_unit: 'plato' });
  });

  it('when the log is exported, then it is a CSV with raw and corrected values that imports back as duplicates only', async () => {
    const { client, batch } = await ownBatch();
    await upload(client, batch.id, csv(MIXED), 'good-rows-only');
    const res = await client.get(`/api/batches/${batch.id}/readings/export`);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text.trim().split('\n');
    expect(lines[0]).toBe('time,instrument,value,unit,temperature_c,calibration_c,correction_factor,corrected_sg_20_20,source,note');
    expect(lines).toHaveLength(5);
    const back = await upload(client, batch.id, csv(res.text), 'all-or-nothing');
    expect(back.body).toMatchObject({ imported: 0, problems: [] });
    expect(back.body.duplicates).toHaveLength(4);
  });
});
