import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, concatMap, exhaustMap, filter, map, merge, mergeMap, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { CatalogueClient } from '../catalogue-client';
import { BrewDaySheetPageActions } from '@app/recipes/state/brew-day-sheet-page.actions';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';
import { RecipeEditorPageActions } from '@app/recipes/state/recipe-editor-page.actions';
import { RecipeListPageActions } from '@app/recipes/state/recipe-list-page.actions';
import { RecipeVersionsPageActions } from '@app/recipes/state/recipe-versions-page.actions';

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

export const saveEntry = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.entryAdded, CataloguePageActions.entryChanged, CataloguePageActions.entryRetiredChanged),
      mergeMap((action) => {
        const request =
          action.type === CataloguePageActions.entryAdded.type
            ? client.addEntry(action.kind, action.input)
            : action.type === CataloguePageActions.entryChanged.type
              ? client.changeEntry(action.kind, action.id, action.input)
              : client.changeEntry(action.kind, action.id, { retired: action.retired });
        return request.pipe(
          map((entry) => CatalogueApiActions.entrySavedSuccess({ kind: action.kind, entry })),
          catchError((error: unknown) => of(CatalogueApiActions.entrySavedFailure({ message: apiErrorMessage(error, 'The entry could not be saved.') }))),
        );
      }),
    ),
  { functional: true },
);

export const previewImport = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.importPreviewRequested),
      switchMap(({ kind, csv }) =>
        client.importCsv(kind, { csv, commit: false }).pipe(
          map((result) => CatalogueApiActions.importPreviewedSuccess({ csv, result })),
          catchError((error: unknown) => of(CatalogueApiActions.importPreviewedFailure({ message: apiErrorMessage(error, 'The file could not be checked.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const commitImport = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.importConfirmed),
      exhaustMap(({ kind, csv, choices }) =>
        client.importCsv(kind, { csv, commit: true, choices }).pipe(
          map((result) => CatalogueApiActions.importCommittedSuccess({ result })),
          catchError((error: unknown) => of(CatalogueApiActions.importCommittedFailure({ message: apiErrorMessage(error, 'The file could not be imported.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const saveStyle = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.styleAdded, CataloguePageActions.styleChanged),
      concatMap((action) =>
        ('styleId' in action ? client.changeStyle(action.styleId, action.input) : client.addStyle(action.input)).pipe(
          map((style) => CatalogueApiActions.styleSavedSuccess({ style })),
          catchError((error: unknown) => of(CatalogueApiActions.styleSavedFailure({ message: apiErrorMessage(error, 'The style could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const saveBrewhouse = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.brewhouseSaved),
      exhaustMap(({ settings }) =>
        client.saveBrewhouse(settings).pipe(
          map((saved) => CatalogueApiActions.brewhouseSavedSuccess({ settings: saved })),
          catchError((error: unknown) => of(CatalogueApiActions.brewhouseSavedFailure({ message: apiErrorMessage(error, 'The brewhouse settings could not be saved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadUsage = createEffect(
  (actions$ = inject(Actions), client = inject(CatalogueClient)) =>
    actions$.pipe(
      ofType(CataloguePageActions.usageRequested),
      switchMap(({ kind, id }) =>
        client.usedIn(kind, id).pipe(
          map((usage) => CatalogueApiActions.usageLoadedSuccess({ id, usage })),
          catchError((error: unknown) => of(CatalogueApiActions.usageLoadedFailure({ id, message: apiErrorMessage(error, 'Where this entry is used could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
