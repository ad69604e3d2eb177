import { Knex } from 'knex';
import { DEFAULT_BREWHOUSE_SETTINGS, RecipeDesign, RecipeVersionSummary, VersionSnapshot } from '@shared/recipes';
import { RecipeRow } from '../db';
import { readJsonColumn } from '../db-json';
import { versionItems } from './recipe-version-items';
import { storedBrewhouseSchema, storedDesignSchema, storedIngredientsSchema } from './version-columns';

/** What a version holds: its design and what it was made with. */
export interface StoredVersion extends VersionSnapshot {
  design: RecipeDesign;
}

/** A recipe row with its owner's name and the current version. */
export interface RecipeRecord extends RecipeRow, StoredVersion {
  owner_name: string;
}

type VersionColumns = { id: number; design: unknown; design_format: number; ingredients: unknown; brewhouse: unknown };

function readVersion(row: VersionColumns): StoredVersion {
  const where = `recipe_versions ${row.id}`;
  return {
    design: readJsonColumn(row.design, storedDesignSchema, `${where}.design`),
    designFormat: row.design_format,
    ingredients: readJsonColumn(row.ingredients, storedIngredientsSchema, `${where}.ingredients`),
    // A brewhouse field added after the version was saved takes its default.
    brewhouse: { ...DEFAULT_BREWHOUSE_SETTINGS, ...readJsonColumn(row.brewhouse, storedBrewhouseSchema.partial(), `${where}.brewhouse`) },
  };
}

const VERSION_COLUMNS = ['recipe_versions.id as version_id', 'recipe_versions.design', 'recipe_versions.design_format', 'recipe_versions.ingredients', 'recipe_versions.brewhouse'];

function toRecord(row: RecipeRow & Omit<VersionColumns, 'id'> & { version_id: number; owner_name: string }): RecipeRecord {
  const { design: _d, design_format: _f, ingredients: _i, brewhouse: _b, version_id, ...recipe } = row;
  return { ...recipe, ...readVersion({ ...row, id: version_id }) };
}

function withCurrentVersion(db: Knex) {
  return db('recipes')
    .join('users', 'users.id', 'recipes.owner_user_id')
    .join('recipe_versions', function joinCurrent() {
      this.on('recipe_versions.recipe_id', '=', 'recipes.id').andOn('recipe_versions.version', '=', 'recipes.current_version');
    })
    .select('recipes.*', 'users.name as owner_name', ...VERSION_COLUMNS);
}

/** Writes version `version` of a recipe and its index lines; call inside the saving transaction. */
async function insertVersion(trx: Knex.Transaction, recipeId: number, version: number, stored: StoredVersion, userId: number): Promise<void> {
  const [versionId] = await trx('recipe_versions').insert({
    recipe_id: recipeId,
    version,
    design: JSON.stringify(stored.design),
    design_format: stored.designFormat,
    ingredients: JSON.stringify(stored.ingredients),
    brewhouse: JSON.stringify(stored.brewhouse),
    created_by_user_id: userId,
  });
  const items = versionItems(stored.design, stored.ingredients).map((item) => ({
    recipe_version_id: versionId,
    position: item.position,
    ingredient_id: item.ingredientId,
    amount: item.amount,
    amount_unit: item.amountUnit,
    use: item.use,
  }));
  if (items.length) await trx('recipe_version_items').insert(items);
}

/** Data access for recipes and their versions. */
export const recipesRepository = {
  async findById(db: Knex, id: number): Promise<RecipeRecord | null> {
    const row = await withCurrentVersion(db).where('recipes.id', id).first();
    return row ? toRecord(row) : null;
  },

  /** The caller's own recipes and every co-op-visible one. */
  async listVisibleTo(db: Knex, userId: number, includeArchived: boolean): Promise<RecipeRecord[]> {
    const query = withCurrentVersion(db)
      .where((q) => q.where('recipes.owner_user_id', userId).orWhere('recipes.visibility', 'coop'))
      .orderBy('recipes.updated_at', 'desc');
    if (!includeArchived) query.whereNull('recipes.archived_at');
    return (await query).map(toRecord);
  },

  /** A new recipe with its first version. */
  async insert(trx: Knex.Transaction, recipe: { ownerId: number; visibility: RecipeRow['visibility']; stored: StoredVersion; clonedFrom?: number }): Promise<number> {
    const [id] = await trx('recipes').insert({
      owner_user_id: recipe.ownerId,
      name: recipe.stored.design.name,
      visibility: recipe.visibility,
      cloned_from_recipe_id: recipe.clonedFrom ?? null,
    });
    await insertVersion(trx, id, 1, recipe.stored, recipe.ownerId);
    return id;
  },

  /** Adds the next version; the row lock keeps two saves from taking the same number. */
  async addVersion(trx: Knex.Transaction, recipeId: number, stored: StoredVersion, userId: number): Promise<number> {
    const row = await trx('recipes').where({ id: recipeId }).forUpdate().first('current_version');
    const version = (row?.current_version ?? 0) + 1;
    await insertVersion(trx, recipeId, version, stored, userId);
    await trx('recipes').where({ id: recipeId }).update({ current_version: version, name: stored.design.name, updated_at: new Date() });
    return version;
  },

  /** The current version under a row lock, so a save compares against what no one else is changing. */
  async lockCurrent(trx: Knex.Transaction, recipeId: number): Promise<RecipeRecord | null> {
    await trx('recipes').where({ id: recipeId }).forUpdate().first('id');
    return recipesRepository.findById(trx, recipeId);
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

  async findVersion(db: Knex, recipeId: number, version: number): Promise<(RecipeVersionSummary & StoredVersion) | null> {
    const row = await db('recipe_versions')
      .join('users', 'users.id', 'recipe_versions.created_by_user_id')
      .where('recipe_versions.recipe_id', recipeId)
      .where('recipe_versions.version', version)
      .first('recipe_versions.id', 'recipe_versions.version', 'recipe_versions.created_at', 'recipe_versions.design', 'recipe_versions.design_format',
        'recipe_versions.ingredients', 'recipe_versions.brewhouse', 'users.name as created_by');
    return row ? { version: row.version, createdAt: row.created_at.toISOString(), createdBy: row.created_by, ...readVersion(row) } : null;
  },
};
