import { Knex } from 'knex';
import { RecipeRow } from '../db';

/** One recipe version that contains an ingredient. */
export interface IngredientUseRow {
  recipeId: number;
  recipeName: string;
  ownerId: number;
  ownerName: string;
  visibility: RecipeRow['visibility'];
  archived: boolean;
  currentVersion: number;
  version: number;
}

/** Reads the index of what each recipe version uses. */
export const ingredientUsageRepository = {
  /** Every recipe version whose index lists the ingredient, by recipe name then newest version first. */
  async versionsUsing(db: Knex, ingredientId: number): Promise<IngredientUseRow[]> {
    const rows = await db('recipe_version_items')
      .join('recipe_versions', 'recipe_versions.id', 'recipe_version_items.recipe_version_id')
      .join('recipes', 'recipes.id', 'recipe_versions.recipe_id')
      .join('users', 'users.id', 'recipes.owner_user_id')
      .where('recipe_version_items.ingredient_id', ingredientId)
      .distinct(
        'recipes.id as recipe_id',
        'recipes.name as recipe_name',
        'recipes.owner_user_id',
        'users.name as owner_name',
        'recipes.visibility',
        'recipes.archived_at',
        'recipes.current_version',
        'recipe_versions.version',
      )
      .orderBy([{ column: 'recipes.name' }, { column: 'recipes.id' }, { column: 'recipe_versions.version', order: 'desc' }]);
    return rows.map((row: Record<string, unknown>) => ({
      recipeId: row.recipe_id as number,
      recipeName: row.recipe_name as string,
      ownerId: row.owner_user_id as number,
      ownerName: row.owner_name as string,
      visibility: row.visibility as RecipeRow['visibility'],
      archived: row.archived_at !== null,
      currentVersion: row.current_version as number,
      version: row.version as number,
    }));
  },
};
