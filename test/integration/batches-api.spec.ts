import { ApiClient } from './helpers/api-client';
import { createFermenter, startBatch } from './helpers/batch-factory';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Batches API', () => {
  const t = useTestApp();

  const signedIn = async (roles: ('member' | 'brewer' | 'admin')[] = ['member']) => {
    const user = await createUser(t.db, roles);
    return { user, client: await ApiClient.signedIn(t.app, user) };
  };

  it('when a member starts a batch from a recipe version, then it copies that version’s predictions and stays planned', async () => {
    const { client } = await signedIn();
    const ids = await createCatalogueEntries(t.db);
    const recipe = (await client.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' })).body;
    await client.send('put', `/api/recipes/${recipe.id}`, { design: { ...sampleDesign(ids), batchVolumeLitres: 40 } });
    const fermenterId = await createFermenter(t.db);
    const batch = await startBatch(client, { recipeId: recipe.id, recipeVersion: 1, fermenterId });
    expect(batch).toMatchObject({ status: 'planned', recipeVersion: 1, fermenterId, editable: true });
    expect(batch.predicted.batchVolumeLitres).toBe(20);
    expect(batch.predicted.og).toBeGreaterThan(1.03);
    // Yeast of the test catalogue: 72–78 % apparent attenuation, so 75 % expected.
    expect(batch.predicted.yeastAttenuationPercent).toBe(75);
    expect(batch.statusDates.planned).not.toBeNull();
  });

  it('when the fermenter is not a fermenter in service, then it answers 400 naming fermenterId and stores nothing', async () => {
    const { client, user } = await signedIn();
    const inMaintenance = await createFermenter(t.db, 'maintenance');
    // Other spec files create batches meanwhile: count only this person's.
    const mine = () => t.db('batches').where({ created_by_user_id: user.id }).count({ n: '*' });
    const before = await mine();
    const res = await client.send('post', '/api/batches', { name: 'x', recipeId: null, recipeVersion: null, brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: inMaintenance });
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveProperty('fermenterId');
    expect(await mine()).toEqual(before);
  });

  it('when the body is absurd, then it answers 400 naming each field', async () => {
    const { client } = await signedIn();
    const res = await client.send('post', '/api/batches', { name: '', recipeId: 5, recipeVersion: null, brewDate: '20.11.2026', plannedVolumeLitres: -3, fermenterId: null });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['brewDate', 'name', 'plannedVolumeLitres', 'recipeVersion']);
  });

  it('when a move skips a step, then it asks first (409) and, confirmed, records only the reached date', async () => {
    const { client } = await signedIn();
    const batch = await startBatch(client);
    const asked = await client.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting' });
    expect(asked.status).toBe(409);
    expect(asked.body.error.code).toBe('status-skips-steps');
    const moved = await client.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true, at: '2026-11-21T10:00:00+01:00' });
    expect(moved.status).toBe(200);
    expect(moved.body.statusDates).toMatchObject({ brewing: null, fermenting: '2026-11-21T09:00:00.000Z' });
    const back = await client.send('post', `/api/batches/${batch.id}/status`, { status: 'brewing' });
    expect(back.status).toBe(409);
    const audit = await t.db('audit_log').where({ subject_type: 'batch', subject_id: batch.id, action: 'batch-status-moved' });
    expect(audit).toHaveLength(1);
  });

  it('when a move is dated before the current status was reached or in the future, then it answers 400 naming at and keeps the batch as it was', async () => {
    const { client } = await signedIn();
    const batch = await startBatch(client);
    await client.send('post', `/api/batches/${batch.id}/status`, { status: 'brewing', at: '2026-11-20T08:00:00Z' });
    const tooEarly = await client.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', at: '2026-11-19T08:00:00Z' });
    expect(tooEarly.status).toBe(400);
    expect(tooEarly.body.fields.at).toMatch(/before the batch became brewing/);
    const future = new Date(Date.now() + 24 * 3600_000).toISOString();
    const tooLate = await client.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', at: future });
    expect(tooLate.status).toBe(400);
    expect(tooLate.body.fields.at).toBe('must not be in the future');
    const row = await t.db('batches').where({ id: batch.id }).first();
    expect(row?.status).toBe('brewing');
    expect(row?.fermenting_at).toBeNull();
  });

  it('when a second batch moves into a fermenter another batch is fermenting in, then it answers 409', async () => {
    const { client } = await signedIn();
    const fermenterId = await createFermenter(t.db);
    const first = await startBatch(client, { fermenterId });
    const second = await startBatch(client, { fermenterId });
    await client.send('post', `/api/batches/${first.id}/status`, { status: 'fermenting', confirmSkip: true });
    const res = await client.send('post', `/api/batches/${second.id}/status`, { status: 'fermenting', confirmSkip: true });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('fermenter-busy');
    const fermenters = (await client.get('/api/batches/fermenters')).body;
    expect(fermenters.find((f: { id: number }) => f.id === fermenterId).heldByBatchId).toBe(first.id);
  });

  it("when another member changes someone's batch, then it answers 403; a brewer and an admin may", async () => {
    const { client: owner } = await signedIn();
    const batch = await startBatch(owner);
    const { client: other } = await signedIn();
    expect((await other.get(`/api/batches/${batch.id}`)).body.editable).toBe(false);
    expect((await other.send('patch', `/api/batches/${batch.id}`, { name: 'Mine now' })).status).toBe(403);
    expect((await other.send('post', `/api/batches/${batch.id}/status`, { status: 'brewing' })).status).toBe(403);
    const { client: brewer } = await signedIn(['member', 'brewer']);
    expect((await brewer.send('patch', `/api/batches/${batch.id}`, { name: 'Renamed by brewer' })).body.name).toBe('Renamed by brewer');
    const { client: admin } = await signedIn(['member', 'admin']);
    expect((await admin.send('post', `/api/batches/${batch.id}/status`, { status: 'brewing' })).status).toBe(200);
  });

  it('when a member starts a batch for someone else, then it answers 403; a brewer may', async () => {
    const { client: member } = await signedIn();
    const { user: other } = await signedIn();
    const refused = await member.send('post', '/api/batches', { name: 'x', recipeId: null, recipeVersion: null, brewerId: other.id, brewDate: '2026-11-20', plannedVolumeLitres: 20, fermenterId: null });
    expect(refused.status).toBe(403);
    const { client: brewer } = await signedIn(['member', 'brewer']);
    expect((await startBatch(brewer, { brewerId: other.id })).brewerId).toBe(other.id);
  });

  it('when the brew day is saved, then the measurements come back beside the predictions and the change is audited', async () => {
    const { client } = await signedIn();
    const batch = await startBatch(client);
    const measured = { preBoilLitres: 26.5, preBoilGravity: 1.044, fermenterLitres: 21, originalGravity: 1.052, originalGravityTemperatureC: 20, pitchedAt: '2026-11-20T18:30:00Z' };
    const res = await client.send('put', `/api/batches/${batch.id}/brew-day`, measured);
    expect(res.status).toBe(200);
    expect(res.body.measured).toEqual({ ...measured, pitchedAt: '2026-11-20T18:30:00.000Z' });
    expect(await t.db('audit_log').where({ subject_type: 'batch', subject_id: batch.id, action: 'brew-day-saved' })).toHaveLength(1);
  });

  it("when listing my batches, then only the caller's active ones come back with their latest gravity", async () => {
    const { client } = await signedIn();
    const active = await startBatch(client, { name: 'Active' });
    const archived = await startBatch(client, { name: 'Done' });
    await client.send('post', `/api/batches/${archived.id}/status`, { status: 'archived', confirmSkip: true });
    await client.send('post', `/api/batches/${active.id}/readings`, { measuredAt: '2026-11-21T08:00:00Z', instrument: 'logger', rawValue: 1.03, rawUnit: 'sg', sampleTemperatureC: null, calibrationTemperatureC: null });
    const mine = (await client.get('/api/batches?mine=true')).body;
    expect(mine.map((b: { id: number }) => b.id)).toEqual([active.id]);
    expect(mine[0].progress).toMatchObject({ latestSg: 1.03, readingCount: 1, finished: false, stuck: false });
  });

  it("when my fermenting batch has a log, then Today's list carries the same forecast as its chart, and other statuses none", async () => {
    const { client } = await signedIn();
    const batch = await startBatch(client, { name: 'Forecast' });
    await client.send('post', `/api/batches/${batch.id}/status`, { status: 'fermenting', confirmSkip: true, at: '2026-11-20T18:00:00Z' });
    // A logistic fall of apparent extract, 12 → 2.4 °P (the model of fermentation-forecast.ts; figures invented for the test).
    for (let d = 0; d <= 5; d += 0.5) {
      const plato = 2.4 + 9.6 / (1 + Math.exp(1.6 * (d - 2.5)));
      const at = new Date(Date.UTC(2026, 10, 21, 8) + d * 86_400_000).toISOString();
      await client.send('post', `/api/batches/${batch.id}/readings`, { measuredAt: at, instrument: 'density-meter', rawValue: Number(plato.toFixed(2)), rawUnit: 'plato', sampleTemperatureC: null, calibrationTemperatureC: null });
    }
    const [listed] = (await client.get('/api/batches?mine=true')).body.filter((b: { id: number }) => b.id === batch.id);
    const chart = (await client.get(`/api/batches/${batch.id}/fermentation`)).body;
    expect(chart.forecast.status).toBe('forecast');
    expect(listed.forecast).toEqual({
      status: 'forecast', finalGravity: chart.forecast.finalGravity, finalGravityLow: chart.forecast.finalGravityLow, finalGravityHigh: chart.forecast.finalGravityHigh,
      finishTime: chart.forecast.finishTime, finishTimeEarly: chart.forecast.finishTimeEarly, finishTimeLate: chart.forecast.finishTimeLate,
    });
    // 2.4 °P is SG 1.0094 (ASBC Tables, Extract in Wort, from memory: 2.5 °P ≈ 1.0098).
    expect(listed.forecast.finalGravity).toBeCloseTo(1.0094, 3);
    const planned = await startBatch(client, { name: 'Planned' });
    const [plannedListed] = (await client.get('/api/batches?mine=true')).body.filter((b: { id: number }) => b.id === planned.id);
    expect(plannedListed.forecast).toBeNull();
  });

  it('when an editor opens the details form, then the brewer choices are the active members only', async () => {
    const { client } = await signedIn(['brewer']);
    const active = await createUser(t.db, ['member'], { name: 'Chosen brewer (test)' });
    const gone = await createUser(t.db, ['member'], { name: 'Former member (test)', active: false });
    const res = await client.get('/api/batches/brewers');
    expect(res.status).toBe(200);
    const ids = res.body.map((b: { id: number }) => b.id);
    expect(ids).toContain(active.id);
    expect(ids).not.toContain(gone.id);
    expect(res.body.find((b: { id: number }) => b.id === active.id)).toEqual({ id: active.id, name: 'Chosen brewer (test)' });
  });
});
