import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, filter, map, of, switchMap, withLatestFrom } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { TodayPageActions } from '@app/today/state/today-page.actions';
import { StockClient } from '../stock-client';
import { loadUnitsOn } from './load-units';
import { StockApiActions } from './stock-api.actions';
import { selectMayKeepStock } from './stock.selectors';

/** Brewers and admins see low stock and best-before alerts on Today. */
export const loadAlerts = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(TodayPageActions.opened),
      withLatestFrom(store.select(selectMayKeepStock)),
      filter(([, mayKeep]) => mayKeep),
      switchMap(() =>
        client.alerts().pipe(
          map((alerts) => StockApiActions.alertsLoadedSuccess({ alerts })),
          catchError((error: unknown) => of(StockApiActions.alertsLoadedFailure({ message: apiErrorMessage(error, 'The stock alerts could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadUnitsForToday = loadUnitsOn(TodayPageActions.opened);
