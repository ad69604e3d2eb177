import { parse } from 'csv-parse/sync';
import { ApiClient } from './helpers/api-client';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';
import { createStockRecipe, planBatch, receiveLot } from './helpers/stock-factory';

// Worked example, invented demo figures checked by hand. The recipe version is 20 L with 4.5 kg
// malt, 25 g hops, 1 pack of yeast and 1 fining tablet. Planned in the horizon: A at 40 L and
// B at 10 L (ratios 2 and 0.5); outside it: C; brewing already: D (not counted).
//   malt   9 + 2.25 = 11.25 kg, on hand 5 + 3 = 8 kg   → buy 3.25 kg
//   hops   0.05 + 0.0125 = 0.0625 kg, on hand 0.1 kg   → covered, not listed
//   yeast  2 + ceil(0.5) = 3 packs, on hand 1          → buy 2
//   fining 2 + ceil(0.5) = 3 tablets, on hand none     → buy 3
describe('Shopping list', () => {
  const t = useTestApp();

  async function workedExample() {
    const user = await createUser(t.db, ['member', 'brewer']);
    const client = await ApiClient.signedIn(t.app, user);
    const recipe = await createStockRecipe(t.db, client);
    const { ingredients, recipeId } = recipe;
    await receiveLot(client, ingredients.malt, 'kg', 5);
    await receiveLot(client, ingredients.malt, 'kg', 3);
    await receiveLot(client, ingredients.hop, 'kg', 0.1);
    await receiveLot(client, ingredients.yeast, 'each', 1);
    const a = await planBatch(client, recipeId, { name: 'Batch A', plannedVolumeLitres: 40, brewDate: '2031-03-03' });
    const b = await planBatch(client, recipeId, { name: 'Batch B', plannedVolumeLitres: 10, brewDate: '2031-03-10' });
    await planBatch(client, recipeId, { name: 'Batch C', plannedVolumeLitres: 20, brewDate: '2031-05-01' });
    const d = await planBatch(client, recipeId, { name: 'Batch D', plannedVolumeLitres: 20, brewDate: '2031-03-05' });
    await client.send('post', `/api/batches/${d.id}/status`, { status: 'brewing' });
    return { client, ingredients, a, b, recipe };
  }

  it('equals the planned bills in the horizon minus stock, grouped by ingredient with the batches that need them', async () => {
    const { client, ingredients, a, b } = await workedExample();
    const res = await client.get('/api/stock/shopping-list?from=2031-03-01&to=2031-03-31');
    expect(res.status).toBe(200);
    const mine = res.body.lines.filter((l: { ingredientId: number }) => Object.values(ingredients).includes(l.ingredientId));

    expect(mine.map(({ ingredientId, unit, needed, inStock, toBuy }: Record<string, unknown>) => ({ ingredientId, unit, needed, inStock, toBuy }))).toEqual([
      { ingredientId: ingredients.malt, unit: 'kg', needed: 11.25, inStock: 8, toBuy: 3.25 },
      { ingredientId: ingredients.yeast, unit: 'each', needed: 3, inStock: 1, toBuy: 2 },
      { ingredientId: ingredients.fining, unit: 'each', needed: 3, inStock: 0, toBuy: 3 },
    ]);
    expect(mine[0].batches).toEqual([
      { batchId: a.id, batchName: 'Batch A', brewDate: '2031-03-03', amount: 9 },
      { batchId: b.id, batchName: 'Batch B', brewDate: '2031-03-10', amount: 2.25 },
    ]);
  });

  it('exports CSV with the list’s columns and neutralises cells a spreadsheet would read as formulas', async () => {
    const { client, recipe } = await workedExample();
    await t.db('fermentables').where({ id: recipe.ids.fermentableId }).update({ name: `=HYPERLINK("x") ${recipe.ids.tag}` });
    const res = await client.get('/api/stock/shopping-list/export?from=2031-03-01&to=2031-03-31');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const rows: string[][] = parse(res.text);
    expect(rows[0]).toEqual(['Ingredient', 'Kind', 'Unit', 'Needed', 'In stock', 'To buy', 'Needed by']);
    const malt = rows.find((row) => row[0].includes(recipe.ids.tag) && row[1] === 'fermentables')!;
    expect(malt[0]).toBe(`'=HYPERLINK("x") ${recipe.ids.tag}`);
    expect(malt.slice(2, 6)).toEqual(['kg', '11.25', '8', '3.25']);
    expect(malt[6]).toBe('Batch A (2031-03-03): 9; Batch B (2031-03-10): 2.25');
  });

  it('answers 400 naming the field for a horizon that ends before it starts', async () => {
    const user = await createUser(t.db, ['member']);
    const client = await ApiClient.signedIn(t.app, user);
    const res = await client.get('/api/stock/shopping-list?from=2031-03-01&to=2031-02-01');
    expect(res.status).toBe(400);
    expect(res.body.fields).toHaveProperty('to');
  });
});
