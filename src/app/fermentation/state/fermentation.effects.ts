import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { FermentationClient } from '../fermentation-client';
import { FermentationApiActions } from './fermentation-api.actions';
import { FermentationPageActions } from './fermentation-page.actions';

export const loadChart = createEffect(
  (actions$ = inject(Actions), client = inject(FermentationClient)) =>
    actions$.pipe(
      ofType(FermentationPageActions.opened),
      switchMap(({ batchId }) =>
        client.chart(batchId).pipe(
          map((chart) => FermentationApiActions.chartLoadedSuccess({ chart })),
          catchError((error: unknown) => of(FermentationApiActions.chartLoadedFailure({ message: apiErrorMessage(error, 'The chart could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
