import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, map, mergeMap, of, switchMap, tap } from 'rxjs';
import { apiErrorMessage } from '@app/core/api-error-message';
import { Notifier } from '@app/core/notifier';
import { OutboxClient } from '../outbox-client';
import { OutboxApiActions } from './outbox-api.actions';
import { OutboxPageActions } from './outbox-page.actions';

export const loadMessages = createEffect(
  (actions$ = inject(Actions), client = inject(OutboxClient)) =>
    actions$.pipe(
      ofType(OutboxPageActions.opened, OutboxPageActions.refreshClicked),
      switchMap(() =>
        client.list().pipe(
          map((messages) => OutboxApiActions.messagesLoadedSuccess({ messages })),
          catchError((error: unknown) => of(OutboxApiActions.messagesLoadedFailure({ message: apiErrorMessage(error, 'The outbox could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const loadMessage = createEffect(
  (actions$ = inject(Actions), client = inject(OutboxClient)) =>
    actions$.pipe(
      ofType(OutboxPageActions.messageOpened),
      switchMap(({ id }) =>
        client.message(id).pipe(
          map((message) => OutboxApiActions.messageLoadedSuccess({ message })),
          catchError((error: unknown) => of(OutboxApiActions.messageLoadedFailure({ message: apiErrorMessage(error, 'The message could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const retryMessage = createEffect(
  (actions$ = inject(Actions), client = inject(OutboxClient)) =>
    actions$.pipe(
      ofType(OutboxPageActions.retryClicked),
      mergeMap(({ id }) =>
        client.retry(id).pipe(
          map((summary) => OutboxApiActions.retrySuccess({ summary })),
          catchError((error: unknown) => of(OutboxApiActions.retryFailure({ message: apiErrorMessage(error, 'The message could not be put back in line.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const showOutboxFailure = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(OutboxApiActions.messagesLoadedFailure, OutboxApiActions.messageLoadedFailure, OutboxApiActions.retryFailure),
      tap(({ message }) => notifier.notify(message)),
    ),
  { functional: true, dispatch: false },
);
