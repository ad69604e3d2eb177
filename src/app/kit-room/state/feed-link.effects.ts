import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, switchMap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { KitRoomClient } from '../kit-room-client';
import { KitRoomApiActions } from './kit-room-api.actions';
import { KitRoomPageActions } from './kit-room-page.actions';

const failure = (error: unknown) => of(KitRoomApiActions.feedLinkFailure({ message: apiErrorMessage(error, 'The calendar link could not be changed.') }));

export const loadFeedLinkStatus = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.opened),
      switchMap(() => client.feedLinkStatus().pipe(map((status) => KitRoomApiActions.feedLinkStatusLoaded({ status })), catchError(failure))),
    ),
  { functional: true },
);

export const issueFeedLink = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.feedLinkRequested),
      exhaustMap(() => client.issueFeedLink().pipe(map((link) => KitRoomApiActions.feedLinkIssuedSuccess({ link })), catchError(failure))),
    ),
  { functional: true },
);

export const revokeFeedLink = createEffect(
  (actions$ = inject(Actions), client = inject(KitRoomClient)) =>
    actions$.pipe(
      ofType(KitRoomPageActions.feedLinkRevoked),
      exhaustMap(() => client.revokeFeedLink().pipe(map(() => KitRoomApiActions.feedLinkRevokedSuccess()), catchError(failure))),
    ),
  { functional: true },
);
