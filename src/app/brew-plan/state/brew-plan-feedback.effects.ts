import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { formatCalendarDay } from '@app/ui/zoned-date-time-pipe';
import { BrewPlanApiActions } from './brew-plan-api.actions';

const NOTICE_DURATION_MS = 6000;
/** A batch is planned in whole days: the wall-clock booking times are not repeated here. */
const day = (local: string) => formatCalendarDay(local.slice(0, 10));

export const showPlanned = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(BrewPlanApiActions.slotAcceptedSuccess, BrewPlanApiActions.batchMovedSuccess),
      tap(({ planned }) => notifier.notify(`Planned on ${planned.kitItemCode}: brew day ${day(planned.startLocal)}, packaged by ${day(planned.endLocal)}.`, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);

export const showFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(BrewPlanApiActions.slotAcceptedFailure, BrewPlanApiActions.batchMovedFailure, BrewPlanApiActions.recipesLoadedFailure, BrewPlanApiActions.brewersLoadedFailure),
      tap(({ message }) => notifier.notify(message, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);
