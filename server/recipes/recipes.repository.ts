import { Knex } from 'knex';
import { RecipeDesign, RecipeVersionSummary } from '@shared/recipes';
import { RecipeRow } from '../db';

/** A recipe row with its owner's name and the current design. */
export interface RecipeRecord extends RecipeRow {
  owner_name: string;
  design: RecipeDesign;
}

function withCurrentDesign(db: Knex) {
  return db('recipes')
    .join('users', 'users.id', 'recipes.owner_user_id')
    .join('recipe_versions', function joinCurrent() {
      this.on('recipe_versions.recipe_id', '=', 'recipes.id').andOn('recipe_versions.version', '=', 'recipes.current_version');
    })
    .select('recipes.*', 'users.name as owner_name', 'recipe_versions.design');
}

/** Data access for recipes and their versions. */
export const recipesRepository = {
  async findById(db: Knex, id: number): Promise<RecipeRecord | null> {
    return (await withCurrentDesign(db).where('recipes.id', id).first()) ?? null;
  },

  /** The caller's own recipes and every co-op-visible one. */
  async listVisibleTo(db: Knex, userId: number, includeArchived: boolean): Promise<RecipeRecord[]> {
    const query = withCurrentDesign(db)
      .where((q) => q.where('recipes.owner_user_id', userId).orWhere('recipes.visibility', 'coop'))
      .orderBy('recipes.updated_at', 'desc');
    if (!includeArchived) query.whereNull('recipes.archived_at');
    return query;
  },

  async insert(db: Knex, recipe: { ownerId: number; visibility: RecipeRow['visibility']; design: RecipeDesign; clonedFrom?: number }): Promise<number> {
    const [id] = await db('recipes').insert({
      owner_user_id: recipe.ownerId,
      name: recipe.design.name,
      visibility: recipe.visibility,
      cloned_from_recipe_id: recipe.clonedFrom ?? null,
    });
    await db('recipe_versions').insert({ recipe_id: id, version: 1, design: JSON.stringify(recipe.design), created_by_user_id: recipe.ownerId });
    return id;
  },

  /** Adds the next version; the row lock keeps two saves from taking the same number. */
  async addVersion(trx: Knex.Transaction, recipeId: number, design: RecipeDesign, userId: number): Promise<number> {
    const row = await trx('recipes').where({ id: recipeId }).forUpdate().first('current_version');
    const version = (row?.current_version ?? 0) + 1;
    await trx('recipe_versions').insert({ recipe_id: recipeId, version, design: JSON.stringify(design), created_by_user_id: userId });
    await trx('recipes').where({ id: recipeId }).update({ current_version: version, name: design.name, updated_at: new Date() });
    return version;
  },

  async update(db: Knex, recipeId: number, changes: Partial<Pick<RecipeRow, 'visibility' | 'archived_at'>>): Promise<void> {
    await db('recipes').where({ id: recipeId }).update({ ...changes, updated_at: new Date() });
  },

  async listVersions(db: Knex, recipeId: number): Promise<RecipeVersionSummary[]> {
    const rows = await db('recipe_versions')
      .join('users', 'users.id', 'recipe_versions.created_by_user_id')
      .where('recipe_versions.recipe_id', recipeId)
      .orderBy('recipe_versions.version', 'desc')
      .select('recipe_versions.version', 'recipe_versions.created_at', 'users.name as created_by');
    return rows.map((r: { version: number; created_at: Date; created_by: string }) => ({ version: r.version, createdAt: r.created_at.toISOString(), createdBy: r.created_by }));
  },

  async findVersion(db: Knex, recipeId: number, version: number): Promise<(RecipeVersionSummary & { design: RecipeDesign }) | null> {
    const row = await db('recipe_versions')
      .join('users', 'users.id', 'recipe_versions.created_by_user_id')
      .where('recipe_versions.recipe_id', recipeId)
      .where('recipe_versions.version', version)
      .first('recipe_versions.version', 'recipe_versions.created_at', 'recipe_versions.design', 'users.name as created_by');
    return row ? { version: row.version, createdAt: row.created_at.toISOString(), createdBy: row.created_by, design: row.design } : null;
  },
};
