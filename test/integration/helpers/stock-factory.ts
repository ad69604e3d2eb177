import { Knex } from 'knex';
import { ApiClient } from './api-client';
import { startBatch } from './batch-factory';
import { createCatalogueEntries, sampleDesign } from './catalogue-factory';

/** Catalogue entries of this test with their ingredient identities, and a recipe over them (20 L, version 1). */
export async function createStockRecipe(db: Knex, client: ApiClient) {
  const ids = await createCatalogueEntries(db);
  const identity = async (table: string, id: number): Promise<number> => (await db(table).where({ id }).first('ingredient_id')).ingredient_id;
  const ingredients = {
    malt: await identity('fermentables', ids.fermentableId),
    hop: await identity('hops', ids.hopId),
    yeast: await identity('yeasts', ids.yeastId),
    fining: await identity('other_additions', ids.otherId),
  };
  const res = await client.send('post', '/api/recipes', { design: sampleDesign(ids), visibility: 'coop' });
  if (res.status !== 201) throw new Error(`creating a recipe failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { ids, ingredients, recipeId: res.body.id as number };
}

/** A planned batch of the recipe's version 1. */
export function planBatch(client: ApiClient, recipeId: number, overrides: Record<string, unknown> = {}) {
  return startBatch(client, { recipeId, recipeVersion: 1, ...overrides });
}

/** Receives a lot through the API and returns its body. */
export async function receiveLot(client: ApiClient, ingredientId: number, unit: 'kg' | 'L' | 'each', quantity: number, bestBefore: string | null = '2027-06-01', receivedOn = '2026-11-01') {
  const res = await client.send('post', '/api/stock/lots', { ingredientId, unit, quantity, receivedOn, bestBefore, supplierNote: 'Test supplier' });
  if (res.status !== 201) throw new Error(`receiving a lot failed: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body;
}
