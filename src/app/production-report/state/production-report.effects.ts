import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { ProductionReportClient } from '../production-report-client';
import { ProductionReportApiActions } from './production-report-api.actions';
import { ProductionReportPageActions } from './production-report-page.actions';

/** The latest range asked for wins: an earlier answer still on its way is dropped. */
export const loadReport = createEffect(
  (actions$ = inject(Actions), client = inject(ProductionReportClient)) =>
    actions$.pipe(
      ofType(ProductionReportPageActions.opened, ProductionReportPageActions.rangeChanged),
      switchMap(({ from, to }) =>
        client.report(from, to).pipe(
          map((report) => ProductionReportApiActions.reportLoadedSuccess({ report })),
          catchError((error: unknown) => of(ProductionReportApiActions.reportLoadedFailure({ message: apiErrorMessage(error, 'The production report could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);
