import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { Store } from '@ngrx/store';
import { catchError, exhaustMap, filter, map, mergeMap, of, switchMap, withLatestFrom } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { authFeature } from '@app/auth/state/auth.feature';
import { MembersClient } from '@app/members/members-client';
import { KitRoomClient } from '../kit-room-client';
import { KitRegisterPageActions } from './kit-register-page.actions';
import { KitRoomApiActions } from './kit-room-api.actions';
import { KitRoomPageActions } from './kit-room-page.actions';
import { selectCalendarRange } from './kit-room.selectors';

export const loadItems = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.opened, KitRegisterPageActions.opened),
      switchMap(() =>
        client.items().pipe(
          map((items) => KitRoomApiActions.itemsLoadedSuccess({ items })),
          catchError((error: unknown) => of(KitRoomApiActions.itemsLoadedFailure({ message: apiErrorMessage(error, 'The kit register could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadBookings = createEffect(
  (actions$ = inject(Actions), store = inject(Store), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(
        KitRoomPageActions.opened,
        KitRoomPageActions.viewChanged,
        KitRoomPageActions.periodChanged,
        KitRoomPageActions.itemFilterChanged,
        KitRoomApiActions.bookingMovedSuccess,
      ),
      withLatestFrom(store.select(selectCalendarRange)),
      map(([, range]) => range),
      filter((range) => range !== null),
      switchMap(({ from, to, itemFilter }) =>
        client.bookings(from, to, itemFilter).pipe(
          map((bookings) => KitRoomApiActions.bookingsLoadedSuccess({ bookings })),
          catchError((error: unknown) => of(KitRoomApiActions.bookingsLoadedFailure({ message: apiErrorMessage(error, 'The calendar could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadMyBookings = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.opened, KitRoomApiActions.bookingCreatedSuccess, KitRoomApiActions.bookingMovedSuccess),
      switchMap(() =>
        client.myBookings().pipe(
          map((bookings) => KitRoomApiActions.myBookingsLoadedSuccess({ bookings })),
          catchError((error: unknown) => of(KitRoomApiActions.myBookingsLoadedFailure({ message: apiErrorMessage(error, 'Your bookings could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const createBooking = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.bookingSubmitted),
      exhaustMap(({ request }) =>
        client.book(request).pipe(
          map((booking) => KitRoomApiActions.bookingCreatedSuccess({ booking })),
          catchError((error: unknown) =>
            of(KitRoomApiActions.bookingCreatedFailure({ message: apiErrorMessage(error, 'The booking could not be made.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const moveBooking = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.bookingMoveSubmitted),
      exhaustMap(({ bookingId, request }) =>
        client.move(bookingId, request).pipe(
          map((booking) => KitRoomApiActions.bookingMovedSuccess({ booking })),
          catchError((error: unknown) => of(KitRoomApiActions.bookingMovedFailure({ message: apiErrorMessage(error, 'The booking could not be moved.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const cancelBooking = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.bookingCancelled),
      mergeMap(({ bookingId }) =>
        client.cancel(bookingId).pipe(
          map(() => KitRoomApiActions.bookingCancelledSuccess({ bookingId })),
          catchError((error: unknown) => of(KitRoomApiActions.bookingCancelledFailure({ message: apiErrorMessage(error, 'The booking could not be cancelled.') }))),
        ),
      ),
    ),
  { functional: true },
);

/** Batches are optional here: when they cannot be loaded the form simply offers none. */
export const loadMyBatches = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.opened),
      switchMap(() =>
        client.myBatches().pipe(
          map((batches) => KitRoomApiActions.myBatchesLoadedSuccess({ batches: batches.map(({ id, name }) => ({ id, name })) })),
          catchError(() => of(KitRoomApiActions.myBatchesLoadedSuccess({ batches: [] }))),
        ),
      ),
    ),
  { functional: true },
);

/** Admins book for anyone: they get the list of active members to choose from. */
export const loadPeople = createEffect(
  (actions$ = inject(Actions), store = inject(Store), members = inject(MembersClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.opened),
      withLatestFrom(store.select(authFeature.selectUser)),
      filter(([, user]) => user?.roles.includes('admin') ?? false),
      switchMap(() =>
        members.list().pipe(
          map(({ members: all }) => KitRoomApiActions.peopleLoadedSuccess({ people: all.filter((m) => m.active).map(({ id, name }) => ({ id, name })) })),
          catchError(() => of(KitRoomApiActions.peopleLoadedSuccess({ people: [] }))),
        ),
      ),
    ),
  { functional: true },
);
