import { randomUUID } from 'node:crypto';
import { analyseDistillate, strengthBreakdown } from '@shared/science';
import { ApiClient } from './helpers/api-client';
import { readingBody, startBatch } from './helpers/batch-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Strength check API', () => {
  const t = useTestApp();

  const client = async (roles: ('member' | 'brewer' | 'admin')[]) => ApiClient.signedIn(t.app, await createUser(t.db, roles));
  const brewDay = { preBoilLitres: null, preBoilGravity: null, fermenterLitres: null, originalGravity: 1.05, originalGravityTemperatureC: 20, pitchedAt: null };

  /** A brewer's batch with OG 1.050 on the brew day and one hydrometer reading of 1.010 at 20 °C. */
  async function batchWithReadings() {
    const brewer = await client(['member', 'brewer']);
    const batch = await startBatch(brewer);
    expect((await brewer.send('put', `/api/batches/${batch.id}/brew-day`, brewDay)).status).toBe(200);
    const reading = (await brewer.send('post', `/api/batches/${batch.id}/readings`, readingBody({ rawValue: 1.01, measuredAt: '2026-11-28T08:00:00Z' }))).body;
    const admin = await client(['admin']);
    const toleranceClass = (await admin.send('post', '/api/lab/tolerance-classes', { name: `Beer ${randomUUID().slice(0, 8)}`, tolerancePercentVolume: 0.5, note: '' })).body;
    return { brewer, admin, batch, reading, toleranceClass };
  }

  it('when anyone opens the check, then its figures equal the science library\'s for the same OG and FG', async () => {
    const { batch, reading } = await batchWithReadings();
    const member = await client(['member']);

    const res = await member.get(`/api/batches/${batch.id}/strength`);

    expect(res.status).toBe(200);
    const library = strengthBreakdown(1.05, reading.correctedSg);
    expect(res.body.figures.densityBased.value).toBe(library.percentVolume20);
    expect(res.body.figures.linearEstimate.value).toBe(library.linearEstimate);
    expect(res.body.figures.nonLinearEstimate.value).toBe(library.nonLinearEstimate);
    expect(res.body.figures.steps.map((s: { value: number }) => s.value)).toEqual([
      library.originalExtract, library.apparentExtract, library.realExtract, library.alcoholByMass, library.beerDensity20, library.ethanolDensity20, library.percentVolume20,
    ]);
    expect(res.body.readingsUsed.map((r: { source: string; instrument: string }) => [r.source, r.instrument])).toEqual([['brew-day', 'hydrometer'], ['reading', 'hydrometer']]);
  });

  it('when a member signs off, then it answers 403 and stores nothing', async () => {
    const { batch, toleranceClass } = await batchWithReadings();
    const res = await (await client(['member'])).send('post', `/api/batches/${batch.id}/strength/sign-offs`, { declaredPercentVolume: 5.2, toleranceClassId: toleranceClass.id });
    expect(res.status).toBe(403);
    expect(await t.db('strength_sign_offs').where({ batch_id: batch.id })).toHaveLength(0);
  });

  it('when a brewer signs off and a reading changes afterwards, then the sign-off is stale and the record keeps what was signed', async () => {
    const { brewer, admin, batch, reading, toleranceClass } = await batchWithReadings();
    const declared = Math.round(strengthBreakdown(1.05, reading.correctedSg).percentVolume20 * 10) / 10;

    const signed = await brewer.send('post', `/api/batches/${batch.id}/strength/sign-offs`, { declaredPercentVolume: declared, toleranceClassId: toleranceClass.id });
    expect(signed.status).toBe(201);
    expect(signed.body).toMatchObject({ stale: false, verdict: { verdict: 'within', tolerancePercentVolume: 0.5 }, signedBy: 'Test member brewer' });
    expect(await t.db('audit_log').where({ action: 'strength-signed-off', subject_id: batch.id })).toHaveLength(1);

    await admin.send('put', `/api/lab/tolerance-classes/${toleranceClass.id}`, { ...toleranceClass, tolerancePercentVolume: 1 });
    const edited = await brewer.send('patch', `/api/readings/${reading.id}`, { sampleTemperatureC: 25 });
    expect(edited.body.correctedSg).not.toBe(reading.correctedSg);

    const record = await brewer.get(`/api/batches/${batch.id}/strength/sign-offs/${signed.body.id}`);
    expect(record.body.stale).toBe(true);
    expect(record.body.verdict.tolerancePercentVolume).toBe(0.5);
    expect(record.body.densityBased).toEqual(signed.body.densityBased);
    expect((await brewer.get(`/api/batches/${batch.id}/strength`)).body.signOffs[0]).toMatchObject({ id: signed.body.id, stale: true });

    const again = await brewer.send('post', `/api/batches/${batch.id}/strength/sign-offs`, { declaredPercentVolume: declared, toleranceClassId: toleranceClass.id });
    expect((await brewer.get(`/api/batches/${batch.id}/strength`)).body.signOffs.map((s: { id: number; stale: boolean }) => [s.id, s.stale])).toEqual([[again.body.id, false], [signed.body.id, true]]);
  });

  it('when the declared strength is outside the tolerance, then the verdict says so and a sign-off is refused', async () => {
    const { brewer, batch, toleranceClass } = await batchWithReadings();
    const check = await brewer.get(`/api/batches/${batch.id}/strength?declared=9&toleranceClassId=${toleranceClass.id}`);
    expect(check.body.verdict).toMatchObject({ verdict: 'outside', declaredPercentVolume: 9 });
    const res = await brewer.send('post', `/api/batches/${batch.id}/strength/sign-offs`, { declaredPercentVolume: 9, toleranceClassId: toleranceClass.id });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('declared-outside-tolerance');
  });

  it('when the body is absurd, then it answers 400 naming the fields', async () => {
    const { brewer, batch } = await batchWithReadings();
    const res = await brewer.send('post', `/api/batches/${batch.id}/strength/sign-offs`, { declaredPercentVolume: 'strong', toleranceClassId: -1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['declaredPercentVolume', 'toleranceClassId']);
  });

  it('when a brewer records a distillate analysis, then it equals the library\'s and the check shows it beside the gravity figures', async () => {
    const { brewer, batch } = await batchWithReadings();
    const request = { batchId: batch.id, sampleVolumeMl: 100, madeUpVolumeMl: 100, distillateDensity: 991.1, temperatureC: 20, densityResolution: 0.1 };
    expect((await (await client(['member'])).send('post', '/api/lab/distillate-analyses', request)).status).toBe(403);

    const res = await brewer.send('post', '/api/lab/distillate-analyses', request);

    expect(res.status).toBe(201);
    expect(res.body.beerPercentVolume20.value).toBe(analyseDistillate(0.1, 0.1, 991.1, 20).beerPercentVolume20);
    expect(res.body.tableName).toBe('Built-in OIML R 22 equation');
    const check = (await brewer.get(`/api/batches/${batch.id}/strength`)).body;
    expect(check.latestLab).toMatchObject({ analysisId: res.body.id, percentVolume20: res.body.beerPercentVolume20 });
    const bad = await brewer.send('post', '/api/lab/distillate-analyses', { ...request, distillateDensity: 500 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(['distillateDensity']);
  });
});
