import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { catchError, concatMap, exhaustMap, map, Observable, of, switchMap, tap, withLatestFrom } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { sameDesign } from '@shared/recipes';
import { RecipesClient } from '../recipes-client';
import { BrewDaySheetPageActions } from './brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
import { RecipeArchiveConfirmationActions } from './recipe-archive-confirmation.actions';
import { RecipesApiActions } from './recipes-api.actions';
import { recipesFeature } from './recipes.feature';

export const loadRecipes = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(RecipeListPageActions.opened, RecipeListPageActions.includeArchivedChanged),
      withLatestFrom(store.select(recipesFeature.selectIncludeArchived)),
      switchMap(([, includeArchived]) =>
        client.list(includeArchived).pipe(
          map((recipes) => RecipesApiActions.recipesLoadedSuccess({ recipes })),
          catchError((error: unknown) => of(RecipesApiActions.recipesLoadedFailure({ message: apiErrorMessage(error, 'The recipes could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.existingOpened, RecipeVersionsPageActions.opened, BrewDaySheetPageActions.opened),
      switchMap(({ recipeId }) =>
        client.get(recipeId).pipe(
          map((recipe) => RecipesApiActions.recipeLoadedSuccess({ recipe })),
          catchError((error: unknown) => of(RecipesApiActions.recipeLoadedFailure({ message: apiErrorMessage(error, 'The recipe could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

/** A save of an unchanged design makes no request; a save the server finds unchanged keeps the version. */
export const saveRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.saveSubmitted),
      withLatestFrom(store.select(recipesFeature.selectCurrent)),
      exhaustMap(([{ recipeId, design, visibility }, current]) => {
        if (recipeId !== null && current?.id === recipeId && sameDesign(current.design, design)) {
          return of(RecipesApiActions.recipeSaveUnchanged({ version: current.version }));
        }
        const saved$: Observable<Action> =
          recipeId === null
            ? client.create({ design, visibility }).pipe(map((recipe) => RecipesApiActions.recipeCreatedSuccess({ recipe })))
            : client.save(recipeId, { design }).pipe(
                map((recipe) =>
                  recipe.version === current?.version && current.id === recipeId
                    ? RecipesApiActions.recipeSaveUnchanged({ version: recipe.version })
                    : RecipesApiActions.recipeSavedSuccess({ recipe }),
                ),
              );
        return saved$.pipe(
          catchError((error: unknown) => of(RecipesApiActions.recipeSavedFailure({ message: apiErrorMessage(error, 'The recipe could not be saved.') }))),
        );
      }),
    ),
  { functional: true },
);

export const updateToCatalogue = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.catalogueUpdateRequested),
      withLatestFrom(store.select(recipesFeature.selectCurrent)),
      exhaustMap(([{ recipeId }, current]) =>
        client.updateToCatalogue(recipeId).pipe(
          map((recipe) => RecipesApiActions.recipeUpdatedToCatalogueSuccess({ recipe, previousVersion: current?.version ?? recipe.version })),
          catchError((error: unknown) =>
            of(RecipesApiActions.recipeUpdatedToCatalogueFailure({ message: apiErrorMessage(error, 'The recipe could not be updated to the catalogue.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const updateRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.visibilityChanged, RecipeArchiveConfirmationActions.archiveConfirmed),
      concatMap((action) =>
        client.update(action.recipeId, 'visibility' in action ? { visibility: action.visibility } : { archived: action.archived }).pipe(
          map((recipe) => RecipesApiActions.recipeUpdatedSuccess({ recipe })),
          catchError((error: unknown) => of(RecipesApiActions.recipeUpdatedFailure({ message: apiErrorMessage(error, 'The change could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const cloneRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.cloneRequested),
      exhaustMap(({ recipeId, name }) =>
        client.clone(recipeId, { name }).pipe(
          map((recipe) => RecipesApiActions.recipeClonedSuccess({ recipe })),
          catchError((error: unknown) => of(RecipesApiActions.recipeClonedFailure({ message: apiErrorMessage(error, 'The recipe could not be cloned.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const openSavedRecipe = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(RecipesApiActions.recipeCreatedSuccess, RecipesApiActions.recipeClonedSuccess, RecipesApiActions.recipeImportedSuccess),
      tap(({ recipe }) => void router.navigate(['/recipes', recipe.id])),
    ),
  { functional: true, dispatch: false },
);
