import { inject } from '@angular/core';
import { Store } from '@ngrx/store';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, EMPTY, map, of, switchMap, tap, withLatestFrom } from 'rxjs';
import { authFeature } from '@app/auth/state/auth.feature';
import { addDays, STOCK_LIMITS } from '@shared/stock';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { Notifier } from '@app/core/notifier';
import { ingredientChoices } from '../ingredient-choice';
import { coopToday } from '../coop-today';
import { StockClient } from '../stock-client';
import { loadUnitsOn } from './load-units';
import { ShoppingListPageActions } from './shopping-list-page.actions';
import { StockApiActions } from './stock-api.actions';
import { StockPageActions } from './stock-page.actions';

export const loadLots = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(StockPageActions.opened),
      switchMap(() =>
        client.lots().pipe(
          map((lots) => StockApiActions.lotsLoadedSuccess({ lots })),
          catchError((error: unknown) => of(StockApiActions.lotsLoadedFailure({ message: apiErrorMessage(error, 'The stock could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

/** The catalogue to receive lots for; a failure leaves the list empty and the dialog says so. */
export const loadChoices = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient)) =>
    actions$.pipe(
      ofType(StockPageActions.opened),
      switchMap(() => client.catalogue().pipe(map((catalogue) => StockApiActions.choicesLoadedSuccess({ ingredients: ingredientChoices(catalogue) })), catchError(() => EMPTY))),
    ),
  { functional: true },
);

/** The person's unit system, so amounts show in kg or lb, g or oz. */
export const loadUnits = loadUnitsOn(StockPageActions.opened, ShoppingListPageActions.opened);

const HORIZON_FIELDS: Record<string, string> = { from: 'From', to: 'To' };

/** The horizon has no form controls to carry the server's reasons, so the message names each field and why. */
function horizonRefusal(error: unknown): string {
  const fields = apiFieldErrors(error);
  if (!fields) return apiErrorMessage(error, 'The shopping list could not be loaded.');
  return Object.entries(fields).map(([field, reason]) => `${HORIZON_FIELDS[field] ?? field}: ${reason}.`).join(' ');
}

export const loadShoppingList = createEffect(
  (actions$ = inject(Actions), client = inject(StockClient), store = inject(Store)) =>
    actions$.pipe(
      ofType(ShoppingListPageActions.opened, ShoppingListPageActions.horizonChanged),
      withLatestFrom(store.select(authFeature.selectCoopTimeZone)),
      map(([action, zone]) => {
        if ('from' in action) return action;
        const today = coopToday(zone);
        return { from: today, to: addDays(today, STOCK_LIMITS.horizonDefaultDays) };
      }),
      switchMap(({ from, to }) =>
        client.shoppingList(from, to).pipe(
          map((list) => StockApiActions.shoppingListLoadedSuccess({ list })),
          catchError((error: unknown) => of(StockApiActions.shoppingListLoadedFailure({ message: horizonRefusal(error) }))),
        ),
      ),
    ),
  { functional: true },
);

export const showStockMessages = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(StockApiActions.lotSavedSuccess, StockApiActions.reorderLevelSavedSuccess, StockApiActions.stockChangeFailure),
      tap(({ message }) => notifier.notify(message)),
    ),
  { functional: true, dispatch: false },
);
