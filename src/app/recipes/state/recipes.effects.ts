import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Action, Store } from '@ngrx/store';
import { catchError, concatMap, exhaustMap, forkJoin, map, Observable, of, switchMap, tap, withLatestFrom } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { RecipesClient } from '../recipes-client';
import { fileStem, parseRecipeFile } from '../recipe-file';
import { BrewDaySheetPageActions } from './brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
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

export const saveRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.saveSubmitted),
      exhaustMap(({ recipeId, design, visibility }) => {
        const saved$: Observable<Action> =
          recipeId === null
            ? client.create({ design, visibility }).pipe(map((recipe) => RecipesApiActions.recipeCreatedSuccess({ recipe })))
            : client.save(recipeId, { design }).pipe(map((recipe) => RecipesApiActions.recipeSavedSuccess({ recipe })));
        return saved$.pipe(
          catchError((error: unknown) => of(RecipesApiActions.recipeSavedFailure({ message: apiErrorMessage(error, 'The recipe could not be saved.') }))),
        );
      }),
    ),
  { functional: true },
);

export const updateRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.visibilityChanged, RecipeEditorPageActions.archiveToggled),
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

export const exportRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.exportRequested),
      exhaustMap(({ recipeId }) =>
        client.exportRecipe(recipeId).pipe(
          map((file) =>
            RecipesApiActions.recipeExportedSuccess({ fileName: `${fileStem(file.design.name)}.recipe.json`, json: JSON.stringify(file, null, 2) }),
          ),
          catchError((error: unknown) => of(RecipesApiActions.recipeExportedFailure({ message: apiErrorMessage(error, 'The recipe could not be exported.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const importRecipe = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeListPageActions.importFileChosen),
      exhaustMap(({ text }) => {
        const parsed = parseRecipeFile(text);
        if (!parsed.ok) return of(RecipesApiActions.recipeImportedFailure({ message: parsed.message }));
        return client.importRecipe(parsed.file).pipe(
          map((recipe) => RecipesApiActions.recipeImportedSuccess({ recipe })),
          catchError((error: unknown) => {
            const reasons = Object.values(apiFieldErrors(error) ?? {});
            const message = apiErrorMessage(error, 'The recipe file could not be imported.');
            return of(RecipesApiActions.recipeImportedFailure({ message: reasons.length ? `Not imported: ${reasons.join('; ')}.` : message }));
          }),
        );
      }),
    ),
  { functional: true },
);

export const loadVersions = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeVersionsPageActions.opened),
      switchMap(({ recipeId }) =>
        client.versions(recipeId).pipe(
          map((versions) => RecipesApiActions.versionsLoadedSuccess({ recipeId, versions })),
          catchError((error: unknown) => of(RecipesApiActions.versionsLoadedFailure({ message: apiErrorMessage(error, 'The versions could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadVersionPair = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeVersionsPageActions.versionsPicked),
      switchMap(({ recipeId, left, right }) =>
        forkJoin({ left: client.version(recipeId, left), right: client.version(recipeId, right) }).pipe(
          map((pair) => RecipesApiActions.versionPairLoadedSuccess(pair)),
          catchError((error: unknown) => of(RecipesApiActions.versionPairLoadedFailure({ message: apiErrorMessage(error, 'The versions could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadPreferences = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeListPageActions.opened, RecipeEditorPageActions.newOpened, RecipeEditorPageActions.existingOpened,
        RecipeVersionsPageActions.opened, BrewDaySheetPageActions.opened),
      switchMap(() =>
        client.preferences().pipe(
          map((preferences) => RecipesApiActions.preferencesLoadedSuccess({ preferences })),
          catchError((error: unknown) => of(RecipesApiActions.preferencesLoadedFailure({ message: apiErrorMessage(error, 'Your unit choice could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const savePreferences = createEffect(
  (actions$ = inject(Actions), client = inject(RecipesClient)) =>
    actions$.pipe(
      ofType(RecipeEditorPageActions.unitSystemChanged),
      switchMap(({ unitSystem }) =>
        client.savePreferences({ unitSystem }).pipe(
          map((preferences) => RecipesApiActions.preferencesSavedSuccess({ preferences })),
          catchError((error: unknown) => of(RecipesApiActions.preferencesSavedFailure({ message: apiErrorMessage(error, 'Your unit choice could not be saved.') }))),
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

export const downloadExport = createEffect(
  (actions$ = inject(Actions)) =>
    actions$.pipe(
      ofType(RecipesApiActions.recipeExportedSuccess),
      tap(({ fileName, json }) => {
        const url = URL.createObjectURL(new Blob([json], { type: 'application/json' }));
        const link = document.createElement('a');
        link.href = url;
        link.download = fileName;
        link.click();
        URL.revokeObjectURL(url);
      }),
    ),
  { functional: true, dispatch: false },
);

export const printSheet = createEffect(
  (actions$ = inject(Actions)) =>
    actions$.pipe(
      ofType(BrewDaySheetPageActions.printRequested),
      tap(() => window.print()),
    ),
  { functional: true, dispatch: false },
);
