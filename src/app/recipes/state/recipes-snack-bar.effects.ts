import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { map, tap } from 'rxjs';
import { RecipesApiActions } from './recipes-api.actions';

const SNACK_DURATION_MS = 5000;

export const showRecipeSuccess = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(
        RecipesApiActions.recipeCreatedSuccess,
        RecipesApiActions.recipeSavedSuccess,
        RecipesApiActions.recipeUpdatedSuccess,
        RecipesApiActions.recipeClonedSuccess,
        RecipesApiActions.recipeImportedSuccess,
      ),
      map((action) => {
        const { recipe } = action;
        switch (action.type) {
          case RecipesApiActions.recipeUpdatedSuccess.type:
            return `${recipe.name} is ${recipe.archived ? 'archived' : recipe.visibility === 'coop' ? 'shared with the co-op' : 'private'}.`;
          case RecipesApiActions.recipeClonedSuccess.type:
            return `Cloned as ${recipe.name}.`;
          case RecipesApiActions.recipeImportedSuccess.type:
            return `Imported ${recipe.name}.`;
          default:
            return `Saved ${recipe.name} as version ${recipe.version}.`;
        }
      }),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: SNACK_DURATION_MS })),
    ),
  { functional: true, dispatch: false },
);

export const showRecipeNotice = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(RecipesApiActions.recipeSaveUnchanged, RecipesApiActions.recipeUpdatedToCatalogueSuccess),
      map((action) =>
        action.type === RecipesApiActions.recipeSaveUnchanged.type
          ? `Nothing changed since version ${action.version}, so no new version was saved.`
          : action.recipe.version === action.previousVersion
            ? `Version ${action.recipe.version} already has the catalogue's current values.`
            : `Version ${action.recipe.version} uses the catalogue's current values; version ${action.previousVersion} keeps its own.`,
      ),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: SNACK_DURATION_MS })),
    ),
  { functional: true, dispatch: false },
);

// A recipe or list that cannot be loaded is said on its page, with the way back, not a second time here.
export const showRecipeFailure = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(
        RecipesApiActions.recipeSavedFailure,
        RecipesApiActions.recipeUpdatedToCatalogueFailure,
        RecipesApiActions.recipeUpdatedFailure,
        RecipesApiActions.recipeClonedFailure,
        RecipesApiActions.recipeExportedFailure,
        RecipesApiActions.recipeImportedFailure,
        RecipesApiActions.versionsLoadedFailure,
        RecipesApiActions.versionPairLoadedFailure,
        RecipesApiActions.preferencesLoadedFailure,
        RecipesApiActions.preferencesSavedFailure,
      ),
      tap(({ message }) => snackBar.open(message, 'Dismiss', { duration: SNACK_DURATION_MS })),
    ),
  { functional: true, dispatch: false },
);
