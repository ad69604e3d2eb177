import { predictRecipe } from '@shared/recipes';
import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Recipe versions as snapshots', () => {
  const t = useTestApp();

  async function recipeWithCatalogue() {
    const ids = await createCatalogueEntries(t.db);
    const owner = await ApiClient.signedIn(t.app, await createUser(t.db));
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
    const created = await owner.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'coop' });
    return { ids, owner, brewer, recipeId: created.body.id as number, created };
  }

  const versionOf = async (client: ApiClient, recipeId: number, version: number) => (await client.get(`/api/recipes/${recipeId}/versions/${version}`)).body;
  const ibuOf = (version: { design: never; ingredients: never; brewhouse: never }) => predictRecipe(version.design, version.ingredients, version.brewhouse).ibu;

  it("when a brewer edits a hop's alpha acid, then saved versions keep their figures and the update to the catalogue makes a new version", async () => {
    const { ids, owner, brewer, recipeId } = await recipeWithCatalogue();
    await owner.send('put', `/api/recipes/${recipeId}`, { design: { ...sampleDesign(ids), notes: 'second' } });
    const before = [await versionOf(owner, recipeId, 1), await versionOf(owner, recipeId, 2)];
    expect(before[0].ingredients.hops).toEqual([expect.objectContaining({ id: ids.hopId, alphaAcidPercent: 10 })]);

    expect((await brewer.send('patch', `/api/ingredients/hops/${ids.hopId}`, { alphaAcidPercent: 13 })).status).toBe(200);

    const after = [await versionOf(owner, recipeId, 1), await versionOf(owner, recipeId, 2)];
    expect(after.map(ibuOf)).toEqual(before.map(ibuOf));
    expect(after[1].ingredients).toEqual(before[1].ingredients);
    // Saving an edit keeps the properties the recipe was made with.
    const edited = await owner.send('put', `/api/recipes/${recipeId}`, { design: { ...sampleDesign(ids), notes: 'third' } });
    expect(edited.body.ingredients.hops[0].alphaAcidPercent).toBe(10);

    const updated = await owner.send('post', `/api/recipes/${recipeId}/catalogue-update`, {});
    expect(updated.status).toBe(200);
    expect(updated.body.version).toBe(4);
    expect(updated.body.ingredients.hops[0].alphaAcidPercent).toBe(13);
    const ratio = ibuOf(updated.body)! / ibuOf(before[1])!;
    // Tinseth's IBU is proportional to the alpha acid amount (Tinseth, "Hop utilization" model).
    expect(ratio).toBeCloseTo(13 / 10, 6);
    expect(ibuOf(await versionOf(owner, recipeId, 2))).toBe(ibuOf(before[1]));
  });

  it('when the owner saves the design unchanged, then no version is made', async () => {
    const { ids, owner, recipeId } = await recipeWithCatalogue();
    const again = await owner.send('put', `/api/recipes/${recipeId}`, { design: sampleDesign(ids) });
    expect(again.status).toBe(200);
    expect(again.body.version).toBe(1);
    expect(await t.db('recipe_versions').where({ recipe_id: recipeId })).toHaveLength(1);
    const updateWithNothingNew = await owner.send('post', `/api/recipes/${recipeId}/catalogue-update`, {});
    expect(updateWithNothingNew.body.version).toBe(1);
  });

  it('when a version is saved, then its index lists every line in SI units with the ingredient identities', async () => {
    const { ids, owner, recipeId } = await recipeWithCatalogue();
    const identities = await Promise.all(
      [['fermentables', ids.fermentableId], ['hops', ids.hopId], ['yeasts', ids.yeastId], ['other_additions', ids.otherId]].map(
        async ([table, id]) => (await t.db(table as 'hops').where({ id: id as number }).first())!.ingredient_id as number,
      ),
    );
    const version = await t.db('recipe_versions').where({ recipe_id: recipeId, version: 1 }).first();
    const items = await t.db('recipe_version_items').where({ recipe_version_id: version!.id }).orderBy('position');
    expect(items.map((i) => [i.ingredient_id, i.amount, i.amount_unit, i.use])).toEqual([
      [identities[0], 4.5, 'kg', 'fermentable'],
      [identities[1], 0.025, 'kg', 'boil'],
      [identities[2], 1, 'each', 'yeast'],
      [identities[3], 1, 'each', 'other'],
    ]);
  });

  it('when an ingredient is asked about, then "used in" lists exactly the recipes whose current or saved versions contain it', async () => {
    const ids = await createCatalogueEntries(t.db);
    const other = await createCatalogueEntries(t.db);
    const owner = await ApiClient.signedIn(t.app, await createUser(t.db, ['member'], { name: 'Used-in owner' }));
    const stranger = await ApiClient.signedIn(t.app, await createUser(t.db));
    const withHop = sampleDesign(ids, 'Uses the hop now');
    const withoutHop = { ...sampleDesign(ids), hops: [{ hopId: other.hopId, amountGrams: 20, time: 60, use: 'boil' as const }] };
    const current = (await owner.send('post', '/api/recipes', { design: withHop, visibility: 'coop' })).body;
    const former = (await owner.send('post', '/api/recipes', { design: { ...withHop, name: 'Used the hop once' }, visibility: 'coop' })).body;
    await owner.send('put', `/api/recipes/${former.id}`, { design: { ...withoutHop, name: 'Used the hop once' } });
    await owner.send('post', '/api/recipes', { design: { ...withoutHop, name: 'Never used it' }, visibility: 'coop' });
    await stranger.send('post', '/api/recipes', { design: { ...withHop, name: 'Private user' }, visibility: 'private' });

    const usage = await owner.get(`/api/ingredients/hops/${ids.hopId}/used-in`);
    expect(usage.status).toBe(200);
    // Listed by recipe name.
    expect(usage.body).toEqual({
      uses: [
        { recipeId: former.id, recipeName: 'Used the hop once', ownerName: 'Used-in owner', currentVersion: 2, versions: [1], inCurrentRecipe: false },
        { recipeId: current.id, recipeName: 'Uses the hop now', ownerName: 'Used-in owner', currentVersion: 1, versions: [1], inCurrentRecipe: true },
      ],
      hiddenRecipeCount: 1,
      hiddenCurrentRecipeCount: 1,
    });
    expect((await owner.get(`/api/ingredients/hops/999999999/used-in`)).status).toBe(404);
  });
});
