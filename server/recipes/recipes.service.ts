import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BatchPrediction } from '@shared/batches';
import { Recipe, RecipeDesign, RecipeSummary, RecipeVersion, RecipeVersionSummary, RecipeVisibility, UpdateRecipeRequest } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log';
import { AppError, forbidden } from '../errors/app-error';
import { assertReferencesExist } from './recipe-references';
import { predictVersion } from './version-prediction';
import { RecipeRecord, recipesRepository } from './recipes.repository';

function toSummary(row: RecipeRecord): RecipeSummary {
  return {
    id: row.id,
    name: row.name,
    ownerId: row.owner_user_id,
    ownerName: row.owner_name,
    visibility: row.visibility,
    archived: row.archived_at !== null,
    version: row.current_version,
    styleId: row.design.styleId,
    batchVolumeLitres: row.design.batchVolumeLitres,
    updatedAt: row.updated_at.toISOString(),
  };
}

const recipeNotFound = () => new AppError('recipe-not-found', 'No recipe you can see has this id.', 404);

/** Recipes: owners edit their own; co-op-visible ones are read and cloned by all; admins may archive any. */
export function createRecipesService(db: Knex) {
  function toRecipe(row: RecipeRecord, user: SessionUser): Recipe {
    return { ...toSummary(row), design: row.design, editable: row.owner_user_id === user.id, createdAt: row.created_at.toISOString() };
  }

  /** The recipe when the caller may see it; someone else's private recipe is reported as not found. */
  async function visible(user: SessionUser, id: number): Promise<RecipeRecord> {
    const row = await recipesRepository.findById(db, id);
    const mayView = row && (row.owner_user_id === user.id || row.visibility === 'coop' || user.roles.includes('admin'));
    if (!mayView) throw recipeNotFound();
    return row;
  }

  async function owned(user: SessionUser, id: number): Promise<RecipeRecord> {
    const row = await visible(user, id);
    if (row.owner_user_id !== user.id) throw forbidden('Only the owner may change this recipe; clone it to make your own.');
    return row;
  }

  return {
    visible,

    async list(user: SessionUser, includeArchived: boolean): Promise<RecipeSummary[]> {
      return (await recipesRepository.listVisibleTo(db, user.id, includeArchived)).map(toSummary);
    },

    async get(user: SessionUser, id: number): Promise<Recipe> {
      return toRecipe(await visible(user, id), user);
    },

    async create(user: SessionUser, design: RecipeDesign, visibility: RecipeVisibility, clonedFrom?: number): Promise<Recipe> {
      await assertReferencesExist(db, design);
      const id = await db.transaction(async (trx) => {
        const newId = await recipesRepository.insert(trx, { ownerId: user.id, visibility, design, clonedFrom });
        await recordAudit(trx, { actorUserId: user.id, action: clonedFrom ? 'recipe-cloned' : 'recipe-created', subjectType: 'recipe', subjectId: newId });
        return newId;
      });
      return this.get(user, id);
    },

    /** Saving stores a new version; earlier versions stay as they were. */
    async save(user: SessionUser, id: number, design: RecipeDesign): Promise<Recipe> {
      const row = await owned(user, id);
      if (row.archived_at) throw new AppError('recipe-archived', 'This recipe is archived; restore it before editing.', 409);
      await assertReferencesExist(db, design);
      await db.transaction(async (trx) => {
        const version = await recipesRepository.addVersion(trx, id, design, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'recipe-saved', subjectType: 'recipe', subjectId: id, detail: { version } });
      });
      return this.get(user, id);
    },

    async update(user: SessionUser, id: number, changes: UpdateRecipeRequest): Promise<Recipe> {
      const row = await visible(user, id);
      const isOwner = row.owner_user_id === user.id;
      const adminArchivingOnly = user.roles.includes('admin') && changes.visibility === undefined;
      if (!isOwner && !adminArchivingOnly) throw forbidden('Only the owner may change this recipe.');
      await recipesRepository.update(db, id, {
        ...(changes.visibility ? { visibility: changes.visibility } : {}),
        ...(changes.archived !== undefined ? { archived_at: changes.archived ? new Date() : null } : {}),
      });
      await recordAudit(db, { actorUserId: user.id, action: 'recipe-updated', subjectType: 'recipe', subjectId: id, detail: { ...changes } });
      return this.get(user, id);
    },

    async clone(user: SessionUser, id: number, name?: string): Promise<Recipe> {
      const source = await visible(user, id);
      const design = { ...source.design, name: name ?? `${source.design.name} (copy)`.slice(0, 100) };
      return this.create(user, design, 'private', id);
    },

    async versions(user: SessionUser, id: number): Promise<RecipeVersionSummary[]> {
      await visible(user, id);
      return recipesRepository.listVersions(db, id);
    },

    async version(user: SessionUser, id: number, version: number): Promise<RecipeVersion> {
      await visible(user, id);
      const found = await recipesRepository.findVersion(db, id, version);
      if (!found) throw new AppError('version-not-found', `This recipe has no version ${version}.`, 404);
      return found;
    },

    /** A saved version the caller may see, with its name and what it predicts (for starting a batch). */
    async versionPrediction(user: SessionUser, id: number, version: number): Promise<{ recipeName: string; prediction: BatchPrediction }> {
      const found = await this.version(user, id, version);
      return { recipeName: found.design.name, prediction: await predictVersion(db, found.design) };
    },
  };
}

export type RecipesService = ReturnType<typeof createRecipesService>;
