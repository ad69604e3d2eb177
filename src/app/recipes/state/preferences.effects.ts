import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { RecipesClient } from '../recipes-client';
import { BrewDaySheetPageActions } from './brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from './recipe-editor-page.actions';
import { RecipeListPageActions } from './recipe-list-page.actions';
import { RecipeVersionsPageActions } from './recipe-versions-page.actions';
import { RecipesApiActions } from './recipes-api.actions';

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
