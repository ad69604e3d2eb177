import { HttpErrorResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, switchMap, tap } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { Notifier } from '@app/core/notifier';
import { AuthClient } from '../auth-client';
import { AcceptInvitationPageActions } from './accept-invitation-page.actions';
import { AuthApiActions } from './auth-api.actions';
import { ForgotPasswordPageActions } from './forgot-password-page.actions';
import { ResetPasswordPageActions } from './reset-password-page.actions';

const isNotFound = (error: unknown) => error instanceof HttpErrorResponse && error.status === 404;

export const loadInvitation = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(AcceptInvitationPageActions.opened),
      switchMap(({ token }) =>
        client.invitation(token).pipe(
          map((invitation) => AuthApiActions.invitationLoadedSuccess({ invitation })),
          catchError((error: unknown) =>
            of(
              AuthApiActions.invitationLoadedFailure({
                notFound: isNotFound(error),
                message: isNotFound(error)
                  ? 'This invitation is unknown, has expired or has already been used. Ask an officer of the co-op for a new one.'
                  : apiErrorMessage(error, 'The invitation could not be loaded. Try again.'),
              }),
            ),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const acceptInvitation = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(AcceptInvitationPageActions.submitted),
      exhaustMap(({ token, name, password }) =>
        client.acceptInvitation(token, { name, password }).pipe(
          map(({ user }) =>
            user
              ? AuthApiActions.invitationAcceptedSuccess({ user })
              : AuthApiActions.invitationAcceptedFailure({ message: 'Joining failed. Try again.', fields: null }),
          ),
          catchError((error: unknown) =>
            of(
              AuthApiActions.invitationAcceptedFailure({
                message: apiErrorMessage(error, 'Joining failed. Try again.'),
                fields: apiFieldErrors(error),
              }),
            ),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const requestPasswordReset = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(ForgotPasswordPageActions.submitted),
      exhaustMap(({ email }) =>
        client.requestPasswordReset({ email }).pipe(
          map(() => AuthApiActions.resetRequestedSuccess()),
          catchError((error: unknown) =>
            of(AuthApiActions.resetRequestedFailure({ message: apiErrorMessage(error, 'The request could not be sent. Try again.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const completePasswordReset = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(ResetPasswordPageActions.submitted),
      exhaustMap(({ token, password }) =>
        client.completePasswordReset({ token, password }).pipe(
          map(() => AuthApiActions.passwordResetSuccess()),
          catchError((error: unknown) =>
            of(
              AuthApiActions.passwordResetFailure({
                message: isNotFound(error)
                  ? 'This reset link is unknown, has expired or has already been used. Ask for a new one.'
                  : apiErrorMessage(error, 'The password could not be changed. Try again.'),
              }),
            ),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const navigateAfterInvitationAccepted = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(AuthApiActions.invitationAcceptedSuccess),
      tap(() => void router.navigate(['/today'])),
    ),
  { functional: true, dispatch: false },
);

export const navigateAfterPasswordReset = createEffect(
  (actions$ = inject(Actions), router = inject(Router), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(AuthApiActions.passwordResetSuccess),
      tap(() => {
        notifier.notify('Your password has been changed. Sign in with the new one.', 8000);
        void router.navigate(['/sign-in']);
      }),
    ),
  { functional: true, dispatch: false },
);
