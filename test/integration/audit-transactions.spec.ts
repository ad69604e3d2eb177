import { randomUUID } from 'node:crypto';
import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { createTestApp, TestApp } from './helpers/test-app';
import { createUser, TestUser } from './helpers/user-factory';

// A trigger refuses audit entries of one test person only, so other specs running against the same
// database are untouched; every write of that person must then leave nothing behind.
describe('Writes and their audit entries share one transaction', () => {
  let t: TestApp;
  let brewer: TestUser;
  let client: ApiClient;
  const trigger = `refuse_audit_${randomUUID().slice(0, 8)}`;

  beforeAll(async () => {
    t = createTestApp();
    brewer = await createUser(t.db, ['member', 'brewer']);
    client = await ApiClient.signedIn(t.app, brewer);
    await t.db.raw(
      `CREATE TRIGGER ${trigger} BEFORE INSERT ON audit_log FOR EACH ROW
       IF NEW.actor_user_id = ${brewer.id} THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit refused for the test'; END IF`,
    );
  });
  afterAll(async () => {
    await t.db.raw(`DROP TRIGGER IF EXISTS ${trigger}`);
    t.close();
    await t.db.destroy();
  });

  it('when the audit entry of a new catalogue entry fails, then neither the entry nor its identity is stored', async () => {
    const name = `Unaudited hop ${randomUUID().slice(0, 8)}`;
    const lastIdentity = (await t.db('ingredients').max({ id: 'id' }))[0].id ?? 0;
    const res = await client.send('post', '/api/ingredients/hops', { name, alphaAcidPercent: 5, form: 'pellet' });
    expect(res.status).toBe(500);
    expect(await t.db('hops').where({ name })).toHaveLength(0);
    // Other spec files add hops meanwhile, each with its identity in one transaction: a hop identity
    // made since then that no hop points at could only be this refused write's.
    const orphans = t.db('ingredients').where('id', '>', lastIdentity).where({ kind: 'hops' })
      .whereNotExists(t.db('hops').whereRaw('hops.ingredient_id = ingredients.id'));
    expect(await orphans).toHaveLength(0);
  });

  it('when the audit entry of a catalogue change fails, then the entry keeps its values', async () => {
    const ids = await createCatalogueEntries(t.db);
    const res = await client.send('patch', `/api/ingredients/hops/${ids.hopId}`, { alphaAcidPercent: 12 });
    expect(res.status).toBe(500);
    expect((await t.db('hops').where({ id: ids.hopId }).first())!.alpha_acid_percent).toBe(10);
  });

  it('when the audit entry of a brewhouse save fails, then the settings stay as they were', async () => {
    const before = await t.db('brewhouse_settings').where({ id: 1 }).first();
    const res = await client.send('put', '/api/brewhouse', {
      boilOffLitresPerHour: 7.7, grainAbsorptionLitresPerKg: 1, kettleLossLitres: 1, fermenterLossLitres: 1,
      mashThicknessLitresPerKg: 3, grainTemperatureC: 18, mashTunHeatCapacityKjPerK: null,
    });
    expect(res.status).toBe(500);
    expect(await t.db('brewhouse_settings').where({ id: 1 }).first()).toEqual(before);
  });

  it('when the audit entry of a recipe write fails, then no recipe, version, index line or change is stored', async () => {
    const ids = await createCatalogueEntries(t.db);
    const design = sampleDesign(ids, `Unaudited ${randomUUID().slice(0, 8)}`);
    expect((await client.send('post', '/api/recipes', { design, visibility: 'private' })).status).toBe(500);
    expect(await t.db('recipes').where({ name: design.name })).toHaveLength(0);

    // A recipe made by someone else's audited write, then changed by the refused person.
    const ownerClient = await ApiClient.signedIn(t.app, await createUser(t.db));
    const recipe = (await ownerClient.send('post', '/api/recipes', { design, visibility: 'coop' })).body;
    await t.db('recipes').where({ id: recipe.id }).update({ owner_user_id: brewer.id });
    const versionRows = await t.db('recipe_versions').where({ recipe_id: recipe.id });
    const itemCount = (await t.db('recipe_version_items').whereIn('recipe_version_id', versionRows.map((v) => v.id))).length;

    expect((await client.send('put', `/api/recipes/${recipe.id}`, { design: { ...design, batchVolumeLitres: 30 } })).status).toBe(500);
    expect((await client.send('patch', `/api/recipes/${recipe.id}`, { visibility: 'private' })).status).toBe(500);
    const stored = await t.db('recipes').where({ id: recipe.id }).first();
    expect(stored).toMatchObject({ current_version: 1, visibility: 'coop' });
    expect(await t.db('recipe_versions').where({ recipe_id: recipe.id })).toHaveLength(1);
    expect(await t.db('recipe_version_items').whereIn('recipe_version_id', versionRows.map((v) => v.id))).toHaveLength(itemCount);
  });
});
