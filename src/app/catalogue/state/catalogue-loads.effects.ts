import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, filter, map, merge, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { BrewDaySheetPageActions } from '@app/recipes/state/brew-day-sheet-page.actions';
import { RecipeEditorPageActions } from '@app/recipes/state/recipe-editor-page.actions';
import { RecipeListPageActions } from '@app/recipes/state/recipe-list-page.actions';
import { RecipeVersionsPageActions } from '@app/recipes/state/recipe-versions-page.actions';
import { CatalogueClient } from '../catalogue-client';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';

/** Pages that need the catalogue, the style list and the brewhouse to show predictions. */
const pagesNeedingCatalogue = [
  CataloguePageActions.opened,
  RecipeEditorPageActions.newOpened,
  RecipeEditorPageActions.existingOpened,
  RecipeVersionsPageActions.opened,
  BrewDaySheetPageActions.opened,
] as const;

// Retired entries are loaded too: old recipes still name them; the pickers and the catalogue filter them.
export const loadCatalogue = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    merge(
      actions$.pipe(ofType(...pagesNeedingCatalogue)),
      actions$.pipe(ofType(CatalogueApiActions.importCommittedSuccess), filter(({ result }) => result.imported + result.updated > 0)),
    ).pipe(
      switchMap(() =>
        client.catalogue(true).pipe(
          map((catalogue) => CatalogueApiActions.catalogueLoadedSuccess({ catalogue })),
          catchError((error: unknown) => of(CatalogueApiActions.catalogueLoadedFailure({ message: apiErrorMessage(error, 'The catalogue could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadStyles = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(...pagesNeedingCatalogue, RecipeListPageActions.opened),
      switchMap(() =>
        client.styles().pipe(
          map((styles) => CatalogueApiActions.stylesLoadedSuccess({ styles })),
          catchError((error: unknown) => of(CatalogueApiActions.stylesLoadedFailure({ message: apiErrorMessage(error, 'The style list could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadBrewhouse = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(...pagesNeedingCatalogue),
      switchMap(() =>
        client.brewhouse().pipe(
          map((settings) => CatalogueApiActions.brewhouseLoadedSuccess({ settings })),
          catchError((error: unknown) => of(CatalogueApiActions.brewhouseLoadedFailure({ message: apiErrorMessage(error, 'The brewhouse settings could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
