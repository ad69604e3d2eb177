import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { BrewPlanApiActions } from './brew-plan-api.actions';

const NOTICE_DURATION_MS = 6000;
const when = (local: string) => local.replace('T', ' ');

export const showPlanned = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(BrewPlanApiActions.slotAcceptedSuccess, BrewPlanApiActions.batchMovedSuccess),
      tap(({ planned }) => notifier.notify(`Planned on ${planned.kitItemCode}: booked from ${when(planned.startLocal)} to ${when(planned.endLocal)}.`, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);

export const showFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(BrewPlanApiActions.slotAcceptedFailure, BrewPlanApiActions.batchMovedFailure, BrewPlanApiActions.recipesLoadedFailure),
      tap(({ message }) => notifier.notify(message, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);
