import { createFeature, createReducer, on } from '@ngrx/store';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipesApiActions } from './recipes-api.actions';

export interface UnsavedEditsState {
  /** The editor holds edits (typed or scaled) that are not saved as a version. */
  unsaved: boolean;
}

export const initialUnsavedEditsState: UnsavedEditsState = { unsaved: false };

/** Whether the open design differs from what was last loaded or saved; the editor marks it and asks before leaving. */
export const unsavedEditsFeature = createFeature({
  name: 'unsavedEdits',
  reducer: createReducer(
    initialUnsavedEditsState,
    on(RecipeEditorPageActions.designEdited, RecipeEditorPageActions.designScaled, (): UnsavedEditsState => ({ unsaved: true })),
    on(
      RecipeEditorPageActions.newOpened,
      RecipeEditorPageActions.existingOpened,
      RecipesApiActions.recipeLoadedSuccess,
      RecipesApiActions.recipeCreatedSuccess,
      RecipesApiActions.recipeSavedSuccess,
      // Nothing changed since the version: the editor holds what is saved.
      RecipesApiActions.recipeSaveUnchanged,
      RecipesApiActions.recipeClonedSuccess,
      RecipesApiActions.recipeImportedSuccess,
      AuthApiActions.signOutSuccess,
      AuthApiActions.sessionExpired,
      (): UnsavedEditsState => initialUnsavedEditsState,
    ),
  ),
});
