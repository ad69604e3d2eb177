import { correctedGravity, GravityReading, RawGravity, ReadingPage, readingsFromColumns } from '@shared/readings';
import { ApiClient } from './helpers/api-client';
import { readingBody, startBatch } from './helpers/batch-factory';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Readings API', () => {
  let t: TestApp;
  beforeAll(() => (t = createTestApp()));
  afterAll(async () => {
    t.close();
    await t.db.destroy();
  });

  async function ownBatch() {
    const user = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, user);
    return { client, batch: await startBatch(client) };
  }

  it('when each instrument logs a reading, then the corrected gravity stored is the shared library’s, beside the raw value', async () => {
    const { client, batch } = await ownBatch();
    // Worked examples: water 998.2067 kg/m³ at 20 °C and 995.6488 at 30 °C (Tanaka et al. 2001);
    // 12.48 °Bx / 1.04 = 12 °P ≈ SG 1.04837 (ASBC extract table, from memory).
    const cases = [
      { body: readingBody({ measuredAt: '2026-11-20T10:00:00Z', rawValue: 1.05, sampleTemperatureC: 30 }), expected: 1.0527 },
      { body: readingBody({ measuredAt: '2026-11-20T10:01:00Z', instrument: 'refractometer', rawValue: 12.48, rawUnit: 'brix', calibrationTemperatureC: null }), expected: 1.04837 },
      { body: readingBody({ measuredAt: '2026-11-20T10:02:00Z', instrument: 'density-meter', rawValue: 1048.4, rawUnit: 'kg-m3', calibrationTemperatureC: null }), expected: 1.05028 },
      { body: readingBody({ measuredAt: '2026-11-20T10:03:00Z', instrument: 'logger', rawValue: 1.049, rawUnit: 'sg', calibrationTemperatureC: null }), expected: 1.049 },
    ];
    for (const { body, expected } of cases) {
      const res = await client.send('post', `/api/batches/${batch.id}/readings`, body);
      expect(res.status).toBe(201);
      const library = correctedGravity(body as RawGravity, { wortCorrectionFactor: 1.04, originalBrix: null }).correctedSg;
      expect(res.body.correctedSg).toBeCloseTo(library, 5);
      expect(res.body.correctedSg).toBeCloseTo(expected, 4);
      expect(res.body).toMatchObject({ rawValue: body.rawValue, rawUnit: body.rawUnit, source: 'hand' });
    }
  });

  it('when a refractometer reads after pitching, then the alcohol correction uses the OG as original °Bx', async () => {
    const { client, batch } = await ownBatch();
    await client.send('put', `/api/batches/${batch.id}/brew-day`, { preBoilLitres: null, preBoilGravity: null, fermenterLitres: null, originalGravity: 1.05, originalGravityTemperatureC: 20, pitchedAt: '2026-11-20T18:00:00Z' });
    const res = await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: '2026-11-23T08:00:00Z', instrument: 'refractometer', rawValue: 7, rawUnit: 'brix', calibrationTemperatureC: null }));
    expect(res.status).toBe(201);
    expect(res.body.originalBrix).toBeGreaterThan(12.8);
    const library = correctedGravity({ instrument: 'refractometer', rawValue: 7, rawUnit: 'brix', sampleTemperatureC: 20, calibrationTemperatureC: null }, { wortCorrectionFactor: 1.04, originalBrix: res.body.originalBrix });
    expect(res.body.correctedSg).toBeCloseTo(library.correctedSg, 5);
    // Alcohol makes the refractometer read high: the corrected gravity is well below 7 °Bx taken as wort.
    expect(res.body.correctedSg).toBeLessThan(1.02);
  });

  it('when the calibration temperature is edited, then the corrected gravity changes and the raw value stays; the edit is audited', async () => {
    const { client, batch } = await ownBatch();
    const reading = (await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ sampleTemperatureC: 25 }))).body;
    const edited = await client.send('patch', `/api/readings/${reading.id}`, { calibrationTemperatureC: 15.56 });
    expect(edited.status).toBe(200);
    expect(edited.body.rawValue).toBe(1.05);
    expect(edited.body.correctedSg).not.toBeCloseTo(reading.correctedSg, 5);
    const row = await t.db('gravity_readings').where({ id: reading.id }).first();
    expect(Number(row!.raw_value)).toBe(1.05);
    const refused = await client.send('patch', `/api/readings/${reading.id}`, { rawValue: 1.06 });
    expect(refused.status).toBe(400);
    expect(refused.body.fields).toHaveProperty('rawValue');
    expect(await t.db('audit_log').where({ subject_type: 'batch', subject_id: batch.id, action: 'reading-edited' })).toHaveLength(1);
  });

  it('when the wort correction factor is derived from a paired hydrometer reading, then refractometer readings are recomputed and their raw °Bx kept', async () => {
    const { client, batch } = await ownBatch();
    const at = '2026-11-20T12:00:00Z';
    const refr = (await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: at, instrument: 'refractometer', rawValue: 12.5, rawUnit: 'brix', calibrationTemperatureC: null }))).body;
    // 12 °P by hydrometer: SG 1.04837 (ASBC table, from memory); factor 12.5 / 12 = 1.042.
    const hydro = (await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: at, rawValue: 12, rawUnit: 'plato' }))).body;
    const res = await client.send('post', `/api/batches/${batch.id}/correction-factor`, { refractometerReadingId: refr.id, hydrometerReadingId: hydro.id });
    expect(res.status).toBe(200);
    expect(res.body.wortCorrectionFactor).toBeCloseTo(1.042, 3);
    const after = await t.db('gravity_readings').where({ id: refr.id }).first();
    expect(Number(after!.raw_value)).toBe(12.5);
    expect(Number(after!.corrected_sg)).toBeCloseTo(hydro.correctedSg, 3);
  });

  it('when a member deletes a reading of their batch, then it is gone and the audit entry keeps it; another member gets 403', async () => {
    const { client, batch } = await ownBatch();
    const reading = (await client.send('post', `/api/batches/${batch.id}/readings`, readingBody())).body;
    const other = await ApiClient.signedIn(t.app, await createUser(t.db));
    expect((await other.send('delete', `/api/readings/${reading.id}`)).status).toBe(403);
    expect((await other.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: '2026-11-22T08:00:00Z' }))).status).toBe(403);
    expect((await client.send('delete', `/api/readings/${reading.id}`)).status).toBe(204);
    const audit = await t.db('audit_log').where({ subject_type: 'batch', subject_id: batch.id, action: 'reading-deleted' }).first();
    expect((audit!.detail as { reading: { rawValue: number } }).reading.rawValue).toBe(1.05);
  });

  it('when the same instrument and time are logged twice, then the second answers 409 and nothing is doubled', async () => {
    const { client, batch } = await ownBatch();
    expect((await client.send('post', `/api/batches/${batch.id}/readings`, readingBody())).status).toBe(201);
    expect((await client.send('post', `/api/batches/${batch.id}/readings`, readingBody())).status).toBe(409);
    expect(await t.db('gravity_readings').where({ batch_id: batch.id })).toHaveLength(1);
  });

  it('when a reading is absurd, then it answers 400 naming each field', async () => {
    const { client, batch } = await ownBatch();
    const res = await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: 'yesterday', instrument: 'refractometer', rawUnit: 'sg', sampleTemperatureC: 300 }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['measuredAt', 'rawUnit', 'sampleTemperatureC']);
    expect(await t.db('gravity_readings').where({ batch_id: batch.id })).toHaveLength(0);
  });

  it('when paging and sorting, then the page holds the asked rows and the total', async () => {
    const { client, batch } = await ownBatch();
    const added: GravityReading[] = [];
    for (let i = 0; i < 5; i++) {
      added.push((await client.send('post', `/api/batches/${batch.id}/readings`, readingBody({ measuredAt: `2026-11-2${i}T08:00:00Z`, rawValue: 1.05 - i * 0.005 }))).body);
    }
    const page: ReadingPage = (await client.get(`/api/batches/${batch.id}/readings?offset=1&limit=2&sort=correctedSg&direction=asc`)).body;
    expect(page.total).toBe(5);
    const rows = readingsFromColumns(page.batchId, page.columns);
    expect(rows.map((r) => r.rawValue)).toEqual([1.035, 1.04]);
    // The columns carry every field of each reading as the single-reading routes send it.
    expect(rows).toEqual([added[3], added[2]]);
  });
});
