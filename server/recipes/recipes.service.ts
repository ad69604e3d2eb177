import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BatchPrediction } from '@shared/batches';
import {
  Recipe,
  RecipeDesign,
  RecipeExport,
  RecipeSummary,
  RecipeVersion,
  RecipeVersionSummary,
  RecipeVisibility,
  UpdateRecipeRequest,
} from '@shared/recipes';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError, forbidden } from '../errors/app-error';
import { createRecipeAccess } from './recipe-access';
import { assertReferencesExist } from './recipe-references';
import { fromRecipeFile, toRecipeFile } from './recipe-file';
import { snapshotFor } from './recipe-snapshot';
import { predictVersion } from './version-prediction';
import { SavedVersionWithPredictions, withPredictions } from './saved-version';
import { sameVersion, toRecipe, toSummary } from './recipe-dto';
import { recipesRepository, StoredVersion } from './recipes.repository';

/** Recipes: owners edit their own; co-op-visible ones are read and cloned by all; admins may archive any. */
export function createRecipesService(db: Knex) {
  const { visible, owned } = createRecipeAccess(db);

  async function create(user: SessionUser, stored: StoredVersion, visibility: RecipeVisibility, clonedFrom?: number): Promise<Recipe> {
    const id = await db.transaction(async (trx) => {
      const newId = await recipesRepository.insert(trx, { ownerId: user.id, visibility, stored, clonedFrom });
      await recordAudit(trx, { actorUserId: user.id, action: clonedFrom ? 'recipe-cloned' : 'recipe-created', subjectType: 'recipe', subjectId: newId });
      return newId;
    });
    return toRecipe((await recipesRepository.findById(db, id))!, user);
  }

  /** Stores `stored` as the next version unless it equals the current one; both under the recipe's row lock. */
  async function addVersionIfChanged(user: SessionUser, id: number, stored: StoredVersion, action: string): Promise<Recipe> {
    await db.transaction(async (trx) => {
      const current = await recipesRepository.lockCurrent(trx, id);
      if (current && sameVersion(current, stored)) return;
      const version = await recipesRepository.addVersion(trx, id, stored, user.id);
      await recordAudit(trx, { actorUserId: user.id, action, subjectType: 'recipe', subjectId: id, detail: { version } });
    });
    return toRecipe((await recipesRepository.findById(db, id))!, user);
  }

  return {
    visible,

    async list(user: SessionUser, includeArchived: boolean): Promise<RecipeSummary[]> {
      return (await recipesRepository.listVisibleTo(db, user.id, includeArchived)).map(toSummary);
    },

    async get(user: SessionUser, id: number): Promise<Recipe> {
      return toRecipe(await visible(user, id), user);
    },

    /** A new recipe, made with today's catalogue and brewhouse. */
    async create(user: SessionUser, design: RecipeDesign, visibility: RecipeVisibility): Promise<Recipe> {
      await assertReferencesExist(db, design);
      return create(user, await snapshotFor(db, design, null), visibility);
    },

    /**
     * Saving stores a new version that keeps the ingredient properties the recipe was made with;
     * a design equal to the current one stores nothing (the answer keeps the current version number).
     */
    async save(user: SessionUser, id: number, design: RecipeDesign): Promise<Recipe> {
      const row = await owned(user, id);
      await assertReferencesExist(db, design);
      return addVersionIfChanged(user, id, await snapshotFor(db, design, row), 'recipe-saved');
    },

    /** The explicit update: a new version of the current design with today's catalogue values and brewhouse. */
    async updateToCatalogue(user: SessionUser, id: number): Promise<Recipe> {
      const row = await owned(user, id);
      return addVersionIfChanged(user, id, await snapshotFor(db, row.design, null), 'recipe-updated-to-catalogue');
    },

    async update(user: SessionUser, id: number, changes: UpdateRecipeRequest): Promise<Recipe> {
      const row = await visible(user, id);
      const isOwner = row.owner_user_id === user.id;
      const adminArchivingOnly = user.roles.includes('admin') && changes.visibility === undefined;
      if (!isOwner && !adminArchivingOnly) throw forbidden('Only the owner may change this recipe.');
      await db.transaction(async (trx) => {
        await recipesRepository.update(trx, id, {
          ...(changes.visibility ? { visibility: changes.visibility } : {}),
          ...(changes.archived !== undefined ? { archived_at: changes.archived ? new Date() : null } : {}),
        });
        await recordAudit(trx, { actorUserId: user.id, action: 'recipe-updated', subjectType: 'recipe', subjectId: id, detail: { ...changes } });
      });
      return this.get(user, id);
    },

    /** A private copy that keeps what the source version was made with. */
    async clone(user: SessionUser, id: number, name?: string): Promise<Recipe> {
      const source = await visible(user, id);
      const design = { ...source.design, name: name ?? `${source.design.name} (copy)`.slice(0, 100) };
      return create(user, { design, designFormat: source.designFormat, ingredients: source.ingredients, brewhouse: source.brewhouse }, 'private', id);
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

    /** A saved version the caller may see, with its name and what it predicts from its own snapshot (for starting a batch). */
    async versionPrediction(user: SessionUser, id: number, version: number): Promise<{ recipeName: string; prediction: BatchPrediction }> {
      const found = await this.version(user, id, version);
      return { recipeName: found.design.name, prediction: predictVersion(found) };
    },

    /**
     * A saved version's design with its predictions, computed from the version's own snapshot only
     * (ingredient properties and brewhouse as saved): what a batch brewed from it points at.
     */
    async savedVersionWithPredictions(user: SessionUser, id: number, version: number): Promise<SavedVersionWithPredictions> {
      return withPredictions(await this.version(user, id, version));
    },

    async exportFile(user: SessionUser, id: number): Promise<{ name: string; file: RecipeExport }> {
      const row = await visible(user, id);
      return { name: row.name, file: await toRecipeFile(db, row) };
    },

    async importFile(user: SessionUser, body: unknown, validate: (design: RecipeDesign) => RecipeDesign): Promise<Recipe> {
      return this.create(user, validate(await fromRecipeFile(db, body)), 'private');
    },
  };
}

export type RecipesService = ReturnType<typeof createRecipesService>;
