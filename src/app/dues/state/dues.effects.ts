import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, Observable, of, switchMap } from 'rxjs';
import { DuesLedger } from '@shared/dues';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { DuesClient } from '../dues-client';
import { DuesApiActions } from './dues-api.actions';
import { DuesLedgerPageActions } from './dues-ledger-page.actions';
import { DuesPageActions } from './dues-page.actions';

export const loadOverview = createEffect(
  (actions$ = inject(Actions), client = inject(DuesClient)) =>
    actions$.pipe(
      ofType(DuesPageActions.opened),
      switchMap(() =>
        client.overview().pipe(
          map((overview) => DuesApiActions.overviewLoadedSuccess({ overview })),
          catchError((error: unknown) => of(DuesApiActions.overviewLoadedFailure({ message: apiErrorMessage(error, 'Your dues could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

/** One payment at a time: a second click while one is on its way is ignored. */
export const payDues = createEffect(
  (actions$ = inject(Actions), client = inject(DuesClient)) =>
    actions$.pipe(
      ofType(DuesPageActions.paymentSubmitted),
      exhaustMap(({ request }) =>
        client.pay(request).pipe(
          map((overview) => DuesApiActions.paymentMadeSuccess({ overview })),
          catchError((error: unknown) => of(DuesApiActions.paymentMadeFailure({ message: apiErrorMessage(error, 'The payment did not go through; nothing was charged.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const stopRenewal = createEffect(
  (actions$ = inject(Actions), client = inject(DuesClient)) =>
    actions$.pipe(
      ofType(DuesPageActions.renewalStopped),
      exhaustMap(() =>
        client.stopRenewal().pipe(
          map((overview) => DuesApiActions.renewalStoppedSuccess({ overview })),
          catchError((error: unknown) => of(DuesApiActions.renewalStoppedFailure({ message: apiErrorMessage(error, 'The renewal could not be stopped.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadLedger = createEffect(
  (actions$ = inject(Actions), client = inject(DuesClient)) =>
    actions$.pipe(
      ofType(DuesLedgerPageActions.opened),
      switchMap(() =>
        client.ledger().pipe(
          map((ledger) => DuesApiActions.ledgerLoadedSuccess({ ledger })),
          catchError((error: unknown) => of(DuesApiActions.ledgerLoadedFailure({ message: apiErrorMessage(error, 'The ledger could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

function ledgerChange(request: Observable<DuesLedger>, notice: string, fallback: string) {
  return request.pipe(
    map((ledger) => DuesApiActions.ledgerChangedSuccess({ ledger, notice })),
    catchError((error: unknown) => of(DuesApiActions.ledgerChangedFailure({ message: apiErrorMessage(error, fallback), fields: apiFieldErrors(error) }))),
  );
}

export const changeLedger = createEffect(
  (actions$ = inject(Actions), client = inject(DuesClient)) =>
    actions$.pipe(
      ofType(DuesLedgerPageActions.planSubmitted, DuesLedgerPageActions.planActiveChanged, DuesLedgerPageActions.cashPaymentSubmitted, DuesLedgerPageActions.refundConfirmed),
      exhaustMap((action) => {
        switch (action.type) {
          case DuesLedgerPageActions.planSubmitted.type:
            return ledgerChange(client.createPlan(action.request), `Plan "${action.request.name}" added.`, 'The plan could not be added.');
          case DuesLedgerPageActions.planActiveChanged.type:
            return ledgerChange(client.setPlanActive(action.planId, action.active), action.active ? 'Plan offered again.' : 'Plan retired.', 'The plan could not be changed.');
          case DuesLedgerPageActions.cashPaymentSubmitted.type:
            return ledgerChange(client.recordCash(action.request), 'Cash payment recorded; a receipt is on its way.', 'The cash payment could not be recorded.');
          default:
            return ledgerChange(client.refund(action.paymentId), 'Payment refunded.', 'The refund did not go through.');
        }
      }),
    ),
  { functional: true },
);
