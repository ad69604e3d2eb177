import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { tap } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { KitRoomApiActions } from './kit-room-api.actions';

const NOTICE_DURATION_MS = 6000;

export const showBookingSuccess = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(KitRoomApiActions.bookingCreatedSuccess, KitRoomApiActions.bookingMovedSuccess, KitRoomApiActions.bookingCancelledSuccess),
      tap((action) => {
        const message =
          action.type === KitRoomApiActions.bookingCancelledSuccess.type
            ? 'Booking cancelled.'
            : `${action.booking.kitItemCode} booked from ${action.booking.startLocal.replace('T', ' ')} to ${action.booking.endLocal.replace('T', ' ')}.`;
        notifier.notify(message, NOTICE_DURATION_MS);
      }),
    ),
  { functional: true, dispatch: false },
);

export const showFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(
        KitRoomApiActions.bookingMovedFailure,
        KitRoomApiActions.bookingCancelledFailure,
        KitRoomApiActions.feedLinkFailure,
        KitRoomApiActions.itemSavedFailure,
        KitRoomApiActions.maintenanceLoadedFailure,
        KitRoomApiActions.maintenanceRecordedFailure,
      ),
      tap(({ message }) => notifier.notify(message, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);
