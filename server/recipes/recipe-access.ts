import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { AppError, forbidden } from '../errors/app-error';
import { RecipeRecord, recipesRepository } from './recipes.repository';

const recipeNotFound = () => new AppError('recipe-not-found', 'No recipe you can see has this id.', 404);
const archived = () => new AppError('recipe-archived', 'This recipe is archived; restore it before editing.', 409);

/** Who may see and who may change a recipe: owners change their own; co-op recipes and admins see more. */
export function createRecipeAccess(db: Knex) {
  /** The recipe when the caller may see it; someone else's private recipe is reported as not found. */
  async function visible(user: SessionUser, id: number): Promise<RecipeRecord> {
    const row = await recipesRepository.findById(db, id);
    const mayView = row && (row.owner_user_id === user.id || row.visibility === 'coop' || user.roles.includes('admin'));
    if (!mayView) throw recipeNotFound();
    return row;
  }

  /** The recipe when the caller owns it and it is not archived. */
  async function owned(user: SessionUser, id: number): Promise<RecipeRecord> {
    const row = await visible(user, id);
    if (row.owner_user_id !== user.id) throw forbidden('Only the owner may change this recipe; clone it to make your own.');
    if (row.archived_at) throw archived();
    return row;
  }

  return { visible, owned };
}
