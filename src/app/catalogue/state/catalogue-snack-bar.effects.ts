import { inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { map, tap } from 'rxjs';
import { CatalogueApiActions } from './catalogue-api.actions';

const SNACK_DURATION_MS = 5000;

export const showCatalogueSuccess = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(CatalogueApiActions.entrySavedSuccess, CatalogueApiActions.styleSavedSuccess, CatalogueApiActions.brewhouseSavedSuccess, CatalogueApiActions.importCommittedSuccess),
      map((action) => {
        switch (action.type) {
          case CatalogueApiActions.entrySavedSuccess.type:
            return `Saved ${action.entry.name}${action.entry.retired ? ' (retired)' : ''}.`;
          case CatalogueApiActions.styleSavedSuccess.type:
            return `Saved the style ${action.style.name}.`;
          case CatalogueApiActions.brewhouseSavedSuccess.type:
            return 'Saved the brewhouse settings.';
          default:
            return action.result.problems.length === 0
              ? `Added ${action.result.imported}, updated ${action.result.updated}, skipped ${action.result.skipped} entries.`
              : `Nothing imported: ${action.result.problems.length} rows need attention.`;
        }
      }),
      tap((message) => snackBar.open(message, 'Dismiss', { duration: SNACK_DURATION_MS })),
    ),
  { functional: true, dispatch: false },
);

export const showCatalogueFailure = createEffect(
  (actions$ = inject(Actions), snackBar = inject(MatSnackBar)) =>
    actions$.pipe(
      ofType(
        CatalogueApiActions.catalogueLoadedFailure,
        CatalogueApiActions.stylesLoadedFailure,
        CatalogueApiActions.brewhouseLoadedFailure,
        CatalogueApiActions.entrySavedFailure,
        CatalogueApiActions.importPreviewedFailure,
        CatalogueApiActions.importCommittedFailure,
        CatalogueApiActions.usageLoadedFailure,
        CatalogueApiActions.styleSavedFailure,
        CatalogueApiActions.brewhouseSavedFailure,
      ),
      tap(({ message }) => snackBar.open(message, 'Dismiss', { duration: SNACK_DURATION_MS })),
    ),
  { functional: true, dispatch: false },
);
