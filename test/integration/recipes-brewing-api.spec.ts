import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Recipes API, brewing rules', () => {
  const t = useTestApp();

  it('when a boil addition is longer than the boil, then it answers 400 naming the hop time and stores nothing', async () => {
    const ids = await createCatalogueEntries(t.db);
    const member = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, member);
    const design = { ...sampleDesign(ids), boilMinutes: 60, hops: [{ hopId: ids.hopId, amountGrams: 20, time: 90, use: 'boil' }] };

    const res = await client.send('post', '/api/recipes', { design, visibility: 'private' });

    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ 'design.hops.0.time': 'must be at most the boil time, 60 min' });
    // Other spec files create recipes meanwhile: only this member's count.
    expect(await t.db('recipes').where({ owner_user_id: member.id })).toHaveLength(0);
  });

  it('when a brewer sets the kettle capacity, then the brewhouse settings take it and refuse a capacity of 0', async () => {
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['brewer']));
    const settings = (await brewer.get('/api/brewhouse')).body;

    const saved = await brewer.send('put', '/api/brewhouse', { ...settings, kettleCapacityLitres: 50 });
    const refused = await brewer.send('put', '/api/brewhouse', { ...settings, kettleCapacityLitres: 0 });

    expect(saved.status).toBe(200);
    expect(saved.body.kettleCapacityLitres).toBe(50);
    expect(refused.status).toBe(400);
    expect(Object.keys(refused.body.fields)).toEqual(['kettleCapacityLitres']);
  });
});
