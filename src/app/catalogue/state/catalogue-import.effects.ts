import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { CatalogueClient } from '../catalogue-client';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';

// The CSV import: a preview that stores nothing, then the commit with the brewer's choices.

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
