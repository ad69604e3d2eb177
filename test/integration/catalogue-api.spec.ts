import { randomUUID } from 'node:crypto';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Ingredient catalogue, styles and brewhouse API', () => {
  const t = useTestApp();

  const brewer = async () => ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
  const member = async () => ApiClient.signedIn(t.app, await createUser(t.db));
  const unique = (name: string) => `${name} ${randomUUID().slice(0, 8)}`;

  it('when a brewer adds, edits and retires a hop, then the catalogue shows it until retired', async () => {
    const client = await brewer();
    const created = await client.send('post', '/api/ingredients/hops', { name: unique('Test hop'), alphaAcidPercent: 7.5, form: 'pellet' });
    expect(created.status).toBe(201);
    const changed = await client.send('patch', `/api/ingredients/hops/${created.body.id}`, { alphaAcidPercent: 8.1 });
    expect(changed.body).toMatchObject({ alphaAcidPercent: 8.1, retired: false });
    await client.send('patch', `/api/ingredients/hops/${created.body.id}`, { retired: true });
    const ids = (await client.get('/api/ingredients')).body.hops.map((h: { id: number }) => h.id);
    expect(ids).not.toContain(created.body.id);
    const all = (await client.get('/api/ingredients?includeRetired=true')).body.hops.map((h: { id: number }) => h.id);
    expect(all).toContain(created.body.id);
  });

  it('when a member tries to add an ingredient, then it answers 403', async () => {
    const res = await (await member()).send('post', '/api/ingredients/hops', { name: unique('Sneaky hop'), alphaAcidPercent: 5, form: 'pellet' });
    expect(res.status).toBe(403);
  });

  it('when an entry is absurd, then it answers 400 naming the fields and keeps the stored entry', async () => {
    const client = await brewer();
    const bad = await client.send('post', '/api/ingredients/yeasts', {
      name: '', attenuationMinPercent: 80, attenuationMaxPercent: 70, temperatureMinC: 18, temperatureMaxC: 20, flocculation: 'sticky',
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields).sort()).toEqual(['flocculation', 'name']);
    const inverted = await client.send('post', '/api/ingredients/yeasts', {
      name: unique('Inverted yeast'), attenuationMinPercent: 80, attenuationMaxPercent: 70, temperatureMinC: 18, temperatureMaxC: 20, flocculation: 'low',
    });
    expect(inverted.status).toBe(400);
    expect(inverted.body.fields).toEqual({ attenuationMaxPercent: 'must not be below the minimum' });
    const hop = await client.send('post', '/api/ingredients/hops', { name: unique('Kept hop'), alphaAcidPercent: 6, form: 'whole' });
    const patch = await client.send('patch', `/api/ingredients/hops/${hop.body.id}`, { alphaAcidPercent: -1 });
    expect(patch.status).toBe(400);
    expect((await t.db('hops').where({ id: hop.body.id }).first()).alpha_acid_percent).toBe(6);
  });

  it('when a CSV has bad rows, then every one is reported by line and nothing is imported', async () => {
    const client = await brewer();
    const good = unique('CSV malt');
    const csv = [
      'name,kind,extractPercent,colourLovibond,maxSharePercent',
      `${good},grain,79,3,100`,
      `${unique('Bad kind')},cereal,79,3,`,
      `${unique('Bad yield')},grain,140,3,`,
      `${good},grain,79,3,100`,
    ].join('\n');
    const res = await client.send('post', '/api/ingredients/fermentables/import', { csv, commit: true });
    expect(res.status).toBe(200);
    expect(res.body.problems.map((p: { line: number }) => p.line)).toEqual([3, 4, 5]);
    expect(res.body.imported).toBe(0);
    expect(await t.db('fermentables').where({ name: good })).toHaveLength(0);
  });

  it('when a CSV is valid, then the preview imports nothing and the commit adds every row', async () => {
    const client = await brewer();
    const names = [unique('CSV pils'), unique('CSV munich')];
    const csv = `name,kind,extractPercent,colourLovibond,maxSharePercent\n${names[0]},grain,81,1.6,100\n${names[1]},grain,78,9,80\n`;
    const preview = await client.send('post', '/api/ingredients/fermentables/import', { csv, commit: false });
    expect(preview.body).toMatchObject({ imported: 0, problems: [] });
    expect(preview.body.rows).toHaveLength(2);
    expect(await t.db('fermentables').whereIn('name', names)).toHaveLength(0);
    const committed = await client.send('post', '/api/ingredients/fermentables/import', { csv, commit: true });
    expect(committed.body.imported).toBe(2);
    expect(await t.db('fermentables').whereIn('name', names)).toHaveLength(2);
  });

  it('when a CSV header is wrong, then line 1 is reported', async () => {
    const res = await (await brewer()).send('post', '/api/ingredients/hops/import', { csv: 'name,alpha\nX,5\n', commit: false });
    expect(res.body.problems).toEqual([{ line: 1, reason: expect.stringContaining('missing columns: alphaAcidPercent, form') }]);
  });

  it('when a brewer adds a style with min above max, then it answers 400; a good one is listed', async () => {
    const client = await brewer();
    const target = { og: { min: 1.04, max: 1.05 }, fg: { min: 1.008, max: 1.012 }, abv: { min: 4, max: 5 }, ibu: { min: 20, max: 30 }, colourSrm: { min: 4, max: 8 } };
    const bad = await client.send('post', '/api/styles', { name: unique('Style'), ...target, ibu: { min: 40, max: 30 } });
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toHaveProperty(['ibu.max']);
    const name = unique('Style');
    expect((await client.send('post', '/api/styles', { name, ...target })).status).toBe(201);
    expect((await client.get('/api/styles')).body.map((s: { name: string }) => s.name)).toContain(name);
  });

  it('when a brewer saves brewhouse settings, then everyone reads them; a member may not change them', async () => {
    const settings = { boilOffLitresPerHour: 3.5, grainAbsorptionLitresPerKg: 0.9, kettleLossLitres: 1, fermenterLossLitres: 0.5, mashThicknessLitresPerKg: 3, grainTemperatureC: 18, mashTunHeatCapacityKjPerK: null, kettleCapacityLitres: 40 };
    expect((await (await brewer()).send('put', '/api/brewhouse', settings)).status).toBe(200);
    const memberClient = await member();
    expect((await memberClient.get('/api/brewhouse')).body).toEqual(settings);
    expect((await memberClient.send('put', '/api/brewhouse', settings)).status).toBe(403);
    expect((await (await brewer()).send('put', '/api/brewhouse', { ...settings, mashThicknessLitresPerKg: 0 })).status).toBe(400);
  });
});
