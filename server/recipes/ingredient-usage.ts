import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { IngredientUsage, IngredientUse } from '@shared/recipes';
import { ingredientUsageRepository } from './ingredient-usage.repository';

/**
 * Which recipes use an ingredient, in their current or any saved version. Recipes the caller may
 * not see (another member's private ones; admins see all) are counted but not named.
 */
export async function ingredientUsage(db: Knex, user: SessionUser, ingredientId: number): Promise<IngredientUsage> {
  const rows = await ingredientUsageRepository.versionsUsing(db, ingredientId);
  const uses = new Map<number, IngredientUse>();
  const hidden = new Set<number>();
  const hiddenCurrent = new Set<number>();
  for (const row of rows) {
    const mayView = row.ownerId === user.id || row.visibility === 'coop' || user.roles.includes('admin');
    if (!mayView) {
      hidden.add(row.recipeId);
      if (row.version === row.currentVersion && !row.archived) hiddenCurrent.add(row.recipeId);
      continue;
    }
    const use = uses.get(row.recipeId) ?? {
      recipeId: row.recipeId,
      recipeName: row.recipeName,
      ownerName: row.ownerName,
      currentVersion: row.currentVersion,
      versions: [],
      inCurrentRecipe: false,
    };
    use.versions.push(row.version);
    if (row.version === row.currentVersion && !row.archived) use.inCurrentRecipe = true;
    uses.set(row.recipeId, use);
  }
  return { uses: [...uses.values()], hiddenRecipeCount: hidden.size, hiddenCurrentRecipeCount: hiddenCurrent.size };
}
