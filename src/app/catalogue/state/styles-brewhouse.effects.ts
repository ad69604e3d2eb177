import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, concatMap, exhaustMap, map, of } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { CatalogueClient } from '../catalogue-client';
import { CatalogueApiActions } from './catalogue-api.actions';
import { CataloguePageActions } from './catalogue-page.actions';

// Saving a style target and the brewhouse settings, both edited on the catalogue page.

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
