import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, filter, map, mergeMap, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { ReadingsClient } from '../readings-client';
import { GravityLogPageActions } from './gravity-log-page.actions';
import { ReadingsApiActions } from './readings-api.actions';

/** Push tokens are listed to the batch's editors only: the batch must be loaded and editable. */
export const loadPushTokens = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(ReadingsApiActions.batchLoadedSuccess),
      filter(({ batch }) => batch.editable),
      switchMap(({ batch }) =>
        client.pushTokens(batch.id).pipe(
          map((tokens) => ReadingsApiActions.pushTokensLoadedSuccess({ tokens })),
          catchError((error: unknown) => of(ReadingsApiActions.pushTokensLoadedFailure({ message: apiErrorMessage(error, 'The push tokens could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const createPushToken = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.pushTokenRequested),
      exhaustMap(({ batchId, label }) =>
        client.createPushToken(batchId, label).pipe(
          map((token) => ReadingsApiActions.pushTokenCreatedSuccess({ token })),
          catchError((error: unknown) => of(ReadingsApiActions.pushTokenCreatedFailure({ message: apiErrorMessage(error, 'The push token could not be made.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const revokePushToken = createEffect(
  (actions$ = inject(Actions), client = inject(ReadingsClient)) =>
    actions$.pipe(
      ofType(GravityLogPageActions.pushTokenRevokeConfirmed),
      mergeMap(({ batchId, tokenId }) =>
        client.revokePushToken(batchId, tokenId).pipe(
          map(() => ReadingsApiActions.pushTokenRevokedSuccess({ tokenId })),
          catchError((error: unknown) => of(ReadingsApiActions.pushTokenRevokedFailure({ message: apiErrorMessage(error, 'The push token could not be revoked.') }))),
        ),
      ),
    ),
  { functional: true },
);
