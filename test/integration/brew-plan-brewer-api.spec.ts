import { ApiClient } from './helpers/api-client';
import { createAleRecipe, createSizedFermenter, mondayInWeeks } from './helpers/brew-plan-factory';
import { createPaidUpUser } from './helpers/dues-factory';
import { testConfig, useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Brew plan API: an admin plans a batch for a brewer', () => {
  const t = useTestApp();
  const zone = testConfig().coopTimeZone;
  const acceptBody = (recipe: { id: number; version: number }, kitItemId: number, brewerId?: number) => ({
    name: 'Planned for a brewer', recipeId: recipe.id, recipeVersion: recipe.version, volumeLitres: 1993, kitItemId, brewDate: mondayInWeeks(zone, 3),
    fermentationDays: 14, conditioningDays: 7, ...(brewerId === undefined ? {} : { brewerId }),
  });

  it('when an admin lists the brewers, then only active members with the brewer role are offered; a plain brewer may not ask', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const brewer = await createUser(t.db, ['member', 'brewer'], { name: 'Offered brewer (test)' });
    const member = await createUser(t.db, ['member']);
    const gone = await createUser(t.db, ['member', 'brewer'], { active: false });

    const res = await admin.get('/api/brew-plan/brewers');
    const asBrewer = await (await ApiClient.signedIn(t.app, brewer)).get('/api/brew-plan/brewers');

    expect(res.status).toBe(200);
    expect(res.body).toContainEqual({ id: brewer.id, name: 'Offered brewer (test)' });
    const ids = res.body.map((b: { id: number }) => b.id);
    expect(ids).not.toContain(member.id);
    expect(ids).not.toContain(gone.id);
    expect(asBrewer.status).toBe(403);
  });

  it('when an admin accepts a slot for a brewer, then the batch and its booking are the brewer’s and the audit names both', async () => {
    const adminUser = await createPaidUpUser(t.db, ['member', 'admin']);
    const admin = await ApiClient.signedIn(t.app, adminUser);
    const brewer = await createPaidUpUser(t.db, ['member', 'brewer']);
    const recipe = await createAleRecipe(t.db, admin);
    const item = await createSizedFermenter(t.db, 1993);

    const res = await admin.send('post', '/api/brew-plan/batches', acceptBody(recipe, item.id, brewer.id));

    expect(res.status).toBe(201);
    expect(await t.db('batches').where({ id: res.body.batchId }).first()).toMatchObject({ brewer_user_id: brewer.id, created_by_user_id: adminUser.id });
    expect(await t.db('bookings').where({ id: res.body.bookingId }).first()).toMatchObject({ user_id: brewer.id, created_by_user_id: adminUser.id });
    const audit = await t.db('audit_log').where({ action: 'batch-planned', subject_id: res.body.batchId }).first();
    expect(audit!.actor_user_id).toBe(adminUser.id);
    expect(typeof audit!.detail === 'string' ? JSON.parse(audit!.detail) : audit!.detail).toMatchObject({ brewerUserId: brewer.id });
  });

  it('when the chosen person is not an active brewer, then 400 names brewerId and nothing is stored; a plain brewer may not plan for another', async () => {
    const admin = await ApiClient.signedIn(t.app, await createPaidUpUser(t.db, ['member', 'admin']));
    const brewerUser = await createPaidUpUser(t.db, ['member', 'brewer']);
    const member = await createPaidUpUser(t.db, ['member']);
    const gone = await createUser(t.db, ['member', 'brewer'], { active: false });
    const recipe = await createAleRecipe(t.db, admin);
    const item = await createSizedFermenter(t.db, 1993);
    const brewer = await ApiClient.signedIn(t.app, brewerUser);
    const brewersRecipe = await createAleRecipe(t.db, brewer);

    const notBrewer = await admin.send('post', '/api/brew-plan/batches', acceptBody(recipe, item.id, member.id));
    const inactive = await admin.send('post', '/api/brew-plan/batches', acceptBody(recipe, item.id, gone.id));
    const nobody = await admin.send('post', '/api/brew-plan/batches', acceptBody(recipe, item.id, 2_000_000_000));
    const forOther = await brewer.send('post', '/api/brew-plan/batches', acceptBody(brewersRecipe, item.id, gone.id));

    for (const refused of [notBrewer, inactive, nobody]) {
      expect(refused.status).toBe(400);
      expect(refused.body.fields.brewerId).toBe('must be an active member with the brewer role');
    }
    expect(forOther.status).toBe(403);
    expect(await t.db('bookings').where({ kit_item_id: item.id })).toHaveLength(0);
    expect(await t.db('batches').where({ fermenter_kit_item_id: item.id })).toHaveLength(0);
  });
});
