import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { DuesApiActions } from './dues-api.actions';

const NOTICE_MS = 6000;

export const showDuesSuccess = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(DuesApiActions.paymentMadeSuccess, DuesApiActions.renewalStoppedSuccess, DuesApiActions.ledgerChangedSuccess),
      tap((action) => {
        if (action.type === DuesApiActions.ledgerChangedSuccess.type) notifier.notify(action.notice, NOTICE_MS);
        else if (action.type === DuesApiActions.paymentMadeSuccess.type) notifier.notify(`Paid: your dues now run through ${action.overview.membership.paidThrough}. A receipt is on its way by e-mail.`, NOTICE_MS);
        else notifier.notify('Renewal stopped; your saved card is forgotten.', NOTICE_MS);
      }),
    ),
  { functional: true, dispatch: false },
);

export const showDuesFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(DuesApiActions.overviewLoadedFailure, DuesApiActions.renewalStoppedFailure, DuesApiActions.ledgerLoadedFailure, DuesApiActions.ledgerChangedFailure),
      tap(({ message }) => notifier.notify(message, NOTICE_MS)),
    ),
  { functional: true, dispatch: false },
);
