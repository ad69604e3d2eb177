import { HttpErrorResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { Actions, createEffect, ofType, ROOT_EFFECTS_INIT } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, tap } from 'rxjs';
import { apiErrorBody, apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { Notifier } from '@app/core/notifier';
import { ShellActions } from '@app/core/shell/shell.actions';
import { AuthClient } from '../auth-client';
import { safeReturnUrl } from '../return-url';
import { AuthApiActions } from './auth-api.actions';
import { SignInPageActions } from './sign-in-page.actions';

const NOTICE_DURATION_MS = 8000;

/** Asks the server who is signed in, once, when the app starts. */
export const loadSession = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(ROOT_EFFECTS_INIT),
      exhaustMap(() =>
        client.session().pipe(
          map(({ user, coopTimeZone }) => AuthApiActions.sessionLoadedSuccess({ user, coopTimeZone })),
          catchError((error: unknown) =>
            of(AuthApiActions.sessionLoadedFailure({ message: apiErrorMessage(error, 'Your session could not be checked.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const signIn = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(SignInPageActions.submitted),
      exhaustMap(({ credentials, returnUrl }) =>
        client.signIn(credentials).pipe(
          map(({ user }) =>
            user
              ? AuthApiActions.signInSuccess({ user, returnUrl })
              : AuthApiActions.signInFailure({ message: 'Signing in failed. Try again.', retryAfterSeconds: null, fields: null }),
          ),
          catchError((error: unknown) => of(signInFailure(error))),
        ),
      ),
    ),
  { functional: true },
);

/** Turns a refused sign-in into its failure action, keeping the wait the server asks for. */
function signInFailure(error: unknown) {
  const retryAfterSeconds = apiErrorBody(error)?.error.retryAfterSeconds ?? null;
  const fallback =
    error instanceof HttpErrorResponse && error.status === 401
      ? 'That e-mail and password do not match.'
      : 'Signing in failed. Try again.';
  return AuthApiActions.signInFailure({
    message: apiErrorMessage(error, fallback),
    retryAfterSeconds,
    fields: apiFieldErrors(error),
  });
}

export const signOut = createEffect(
  (actions$ = inject(Actions), client = inject(AuthClient)) =>
    actions$.pipe(
      ofType(ShellActions.signOutClicked),
      exhaustMap(() =>
        client.signOut().pipe(
          map(() => AuthApiActions.signOutSuccess()),
          catchError((error: unknown) =>
            of(AuthApiActions.signOutFailure({ message: apiErrorMessage(error, 'Signing out failed. Try again.') })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const navigateAfterSignIn = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(AuthApiActions.signInSuccess),
      tap(({ returnUrl }) => void router.navigateByUrl(safeReturnUrl(returnUrl))),
    ),
  { functional: true, dispatch: false },
);

export const navigateAfterSignOut = createEffect(
  (actions$ = inject(Actions), router = inject(Router)) =>
    actions$.pipe(
      ofType(AuthApiActions.signOutSuccess),
      tap(() => void router.navigate(['/sign-in'])),
    ),
  { functional: true, dispatch: false },
);

/** A session that ended on the server sends the person to sign in, then back where they were. */
export const navigateAfterSessionExpired = createEffect(
  (actions$ = inject(Actions), router = inject(Router), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(AuthApiActions.sessionExpired),
      tap(() => {
        notifier.notify('Your session has ended. Please sign in again.', NOTICE_DURATION_MS);
        void router.navigate(['/sign-in'], { queryParams: { returnUrl: router.url } });
      }),
    ),
  { functional: true, dispatch: false },
);

export const showAuthError = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(AuthApiActions.sessionLoadedFailure, AuthApiActions.signOutFailure),
      tap(({ message }) => notifier.notify(message, NOTICE_DURATION_MS)),
    ),
  { functional: true, dispatch: false },
);
