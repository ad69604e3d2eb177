import { Knex } from 'knex';
import { IngredientKind } from '@shared/recipes';

// Recipes, their saved versions and the ingredient identities their lines point at.

export interface RecipeRow {
  id: number;
  owner_user_id: number;
  name: string;
  visibility: 'private' | 'coop';
  current_version: number;
  cloned_from_recipe_id: number | null;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/** JSON columns arrive as text or parsed, by driver version: repositories parse and check them. */
export interface RecipeVersionRow {
  id: number;
  recipe_id: number;
  version: number;
  design: unknown;
  design_format: number;
  ingredients: unknown;
  brewhouse: unknown;
  created_by_user_id: number;
  created_at: Date;
}

export interface IngredientRow {
  id: number;
  kind: IngredientKind;
  created_at: Date;
}

export interface RecipeVersionItemRow {
  id: number;
  recipe_version_id: number;
  position: number;
  ingredient_id: number;
  amount: number;
  amount_unit: 'kg' | 'L' | 'each';
  use: string;
}

declare module 'knex/types/tables' {
  interface Tables {
    recipes: Knex.CompositeTableType<RecipeRow, Omit<RecipeRow, 'id' | 'created_at' | 'updated_at' | 'archived_at' | 'current_version'> & { current_version?: number }, Partial<RecipeRow>>;
    recipe_versions: Knex.CompositeTableType<
      RecipeVersionRow,
      Omit<RecipeVersionRow, 'id' | 'created_at' | 'design' | 'ingredients' | 'brewhouse'> & { design: string; ingredients: string; brewhouse: string },
      Partial<Omit<RecipeVersionRow, 'design' | 'ingredients' | 'brewhouse'>> & { design?: string; ingredients?: string; brewhouse?: string }
    >;
    recipe_version_items: Knex.CompositeTableType<RecipeVersionItemRow, Omit<RecipeVersionItemRow, 'id'>>;
    ingredients: Knex.CompositeTableType<IngredientRow, Omit<IngredientRow, 'id' | 'created_at'>>;
  }
}
