import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Recipes API', () => {
  const t = useTestApp();

  async function memberWithCatalogue() {
    const ids = await createCatalogueEntries(t.db);
    const member = await createUser(t.db);
    return { ids, member, client: await ApiClient.signedIn(t.app, member) };
  }

  it('when a member creates and saves a recipe, then each save is a version and earlier versions stay', async () => {
    const { ids, client } = await memberWithCatalogue();
    const created = await client.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ version: 1, editable: true, visibility: 'private' });
    const changed = { ...sampleDesign(ids), batchVolumeLitres: 40 };
    const saved = await client.send('put', `/api/recipes/${created.body.id}`, { design: changed });
    expect(saved.status).toBe(200);
    expect(saved.body.version).toBe(2);
    const versions = await client.get(`/api/recipes/${created.body.id}/versions`);
    expect(versions.body.map((v: { version: number }) => v.version)).toEqual([2, 1]);
    const first = await client.get(`/api/recipes/${created.body.id}/versions/1`);
    expect(first.body.design.batchVolumeLitres).toBe(20);
    expect(await t.db('recipe_versions').where({ recipe_id: created.body.id })).toHaveLength(2);
  });

  it('when the design is absurd, then it answers 400 naming each field and stores nothing', async () => {
    const { ids, member, client } = await memberWithCatalogue();
    const bad = {
      ...sampleDesign(ids),
      batchVolumeLitres: 0,
      fermentables: [{ fermentableId: ids.fermentableId, amountKg: -2 }],
      hops: [{ hopId: ids.hopId, amountGrams: 1e9, time: 60, use: 'boil' }],
    };
    const res = await client.send('post', '/api/recipes', { design: bad, visibility: 'private' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.fields).sort()).toEqual(['design.batchVolumeLitres', 'design.fermentables.0.amountKg', 'design.hops.0.amountGrams']);
    // Other spec files create recipes meanwhile: only this member's count.
    expect(await t.db('recipes').where({ owner_user_id: member.id })).toHaveLength(0);
  });

  it('when the design names an unknown ingredient, then it answers 400 naming that item', async () => {
    const { ids, client } = await memberWithCatalogue();
    const design = { ...sampleDesign(ids), hops: [{ hopId: 99999999, amountGrams: 20, time: 60, use: 'boil' }] };
    const res = await client.send('post', '/api/recipes', { design, visibility: 'private' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveProperty(['design.hops.0.hopId']);
  });

  it("when another member edits someone's shared recipe, then it answers 403; they can view and clone it", async () => {
    const { ids, client: owner } = await memberWithCatalogue();
    const other = await ApiClient.signedIn(t.app, await createUser(t.db));
    const created = await owner.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'coop' });
    const id = created.body.id;
    expect((await other.get(`/api/recipes/${id}`)).body.editable).toBe(false);
    expect((await other.send('put', `/api/recipes/${id}`, { design: sampleDesign(ids) })).status).toBe(403);
    expect((await other.send('patch', `/api/recipes/${id}`, { visibility: 'private' })).status).toBe(403);
    const clone = await other.send('post', `/api/recipes/${id}/clone`, {});
    expect(clone.status).toBe(201);
    expect(clone.body).toMatchObject({ version: 1, editable: true, visibility: 'private', name: 'Test pale (copy)' });
  });

  it("when a member asks for someone else's private recipe, then it answers 404 and it is not in their list", async () => {
    const { ids, client: owner } = await memberWithCatalogue();
    const other = await ApiClient.signedIn(t.app, await createUser(t.db));
    const created = await owner.send('post', '/api/recipes', { design: sampleDesign(ids, 'Secret'), visibility: 'private' });
    expect((await other.get(`/api/recipes/${created.body.id}`)).status).toBe(404);
    expect((await other.get('/api/recipes')).body.map((r: { id: number }) => r.id)).not.toContain(created.body.id);
  });

  it('when the owner shares, archives and restores a recipe, then the list shows it accordingly; an admin may archive any', async () => {
    const { ids, client: owner } = await memberWithCatalogue();
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const id = (await owner.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' })).body.id;
    expect((await owner.send('patch', `/api/recipes/${id}`, { visibility: 'coop' })).body.visibility).toBe('coop');
    expect((await admin.send('patch', `/api/recipes/${id}`, { archived: true })).body.archived).toBe(true);
    expect((await owner.get('/api/recipes')).body.map((r: { id: number }) => r.id)).not.toContain(id);
    expect((await owner.get('/api/recipes?includeArchived=true')).body.map((r: { id: number }) => r.id)).toContain(id);
    expect((await owner.send('put', `/api/recipes/${id}`, { design: sampleDesign(ids) })).status).toBe(409);
    expect((await owner.send('patch', `/api/recipes/${id}`, { archived: false })).body.archived).toBe(false);
  });

  it('when a recipe is exported and imported, then the imported design equals the original', async () => {
    const { ids, client } = await memberWithCatalogue();
    const id = (await client.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' })).body.id;
    const file = await client.get(`/api/recipes/${id}/export`);
    expect(file.status).toBe(200);
    expect(file.body).toMatchObject({ format: 'commonwort-recipe', formatVersion: 2 });
    expect(file.body.design.fermentables[0].name).toContain('Test pale malt');
    const imported = await client.send('post', '/api/recipes/import', file.body);
    expect(imported.status).toBe(201);
    expect(imported.body.design).toEqual(sampleDesign(ids));
  });

  it('when an imported file names an ingredient the co-op lacks, then it answers 400 naming it', async () => {
    const { ids, client } = await memberWithCatalogue();
    const id = (await client.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'private' })).body.id;
    const file = (await client.get(`/api/recipes/${id}/export`)).body;
    file.design.hops[0].name = 'A hop nobody stocks';
    const res = await client.send('post', '/api/recipes/import', file);
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveProperty(['design.hops.0']);
  });

  it('when a member sets US units, then the preference is kept and audited; an unknown system changes and audits nothing', async () => {
    const { client, member: user } = await memberWithCatalogue();
    expect((await client.get('/api/preferences')).body).toEqual({ unitSystem: 'metric' });
    expect((await client.send('put', '/api/preferences', { unitSystem: 'us' })).status).toBe(200);
    expect((await client.get('/api/preferences')).body).toEqual({ unitSystem: 'us' });
    expect((await client.send('put', '/api/preferences', { unitSystem: 'imperial' })).status).toBe(400);
    const audited = await t.db('audit_log').where({ action: 'preferences-changed', subject_id: user.id });
    expect(audited.map((row) => row.actor_user_id)).toEqual([user.id]);
  });
});
