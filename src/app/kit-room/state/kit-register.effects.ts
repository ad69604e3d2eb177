import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, concatMap, exhaustMap, map, of, switchMap } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { KitRoomClient } from '../kit-room-client';
import { KitRegisterPageActions } from './kit-register-page.actions';
import { KitRoomApiActions } from './kit-room-api.actions';

export const saveItem = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRegisterPageActions.itemSubmitted, KitRegisterPageActions.itemChanged),
      concatMap((action) =>
        ('input' in action ? client.createItem(action.input) : client.updateItem(action.kitItemId, action.changes)).pipe(
          map((item) => KitRoomApiActions.itemSavedSuccess({ item })),
          catchError((error: unknown) =>
            of(KitRoomApiActions.itemSavedFailure({ message: apiErrorMessage(error, 'The item could not be saved.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const loadMaintenance = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRegisterPageActions.itemSelected),
      switchMap(({ kitItemId }) =>
        client.maintenanceLog(kitItemId).pipe(
          map((entries) => KitRoomApiActions.maintenanceLoadedSuccess({ kitItemId, entries })),
          catchError((error: unknown) => of(KitRoomApiActions.maintenanceLoadedFailure({ message: apiErrorMessage(error, 'The maintenance log could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const recordMaintenance = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRegisterPageActions.maintenanceSubmitted),
      exhaustMap(({ kitItemId, input }) =>
        client.recordMaintenance(kitItemId, input).pipe(
          map((entry) => KitRoomApiActions.maintenanceRecordedSuccess({ entry })),
          catchError((error: unknown) =>
            of(KitRoomApiActions.maintenanceRecordedFailure({ message: apiErrorMessage(error, 'The entry could not be saved.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);
