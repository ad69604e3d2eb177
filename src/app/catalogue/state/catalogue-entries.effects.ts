import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, map, mergeMap, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { CatalogueClient } from '../catalogue-client';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';

// Catalogue entries: adding, changing and retiring one, and where it is used.

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
