import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, tap } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { RecipesClient } from '../recipes-client';
import { fileStem, parseRecipeFile } from '../recipe-file';
import { BrewDaySheetPageActions } from './brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipesApiActions } from './recipes-api.actions';

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
