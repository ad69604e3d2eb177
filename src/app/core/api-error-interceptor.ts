import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Store } from '@ngrx/store';
import { catchError, throwError } from 'rxjs';
import { SESSION_URL } from '@app/auth/auth-client';
import { AuthApiActions } from '@app/auth/state/auth-api.actions';
import { apiErrorBody } from './api-error-message';

/**
 * Reports a session that ended on the server (401 `not-signed-in` from /api) so the app can send the
 * person to sign in. The session probe and refused sign-ins are left to their own effects.
 */
export const apiErrorInterceptor: HttpInterceptorFn = (request, next) => {
  const store = inject(Store);
  return next(request).pipe(
    catchError((error: unknown) => {
      if (isSessionGone(request.url, error)) {
        store.dispatch(AuthApiActions.sessionExpired());
      }
      return throwError(() => error);
    }),
  );
};

function isSessionGone(url: string, error: unknown): boolean {
  if (!(error instanceof HttpErrorResponse) || error.status !== 401) {
    return false;
  }
  if (!url.startsWith('/api/') || url.startsWith(SESSION_URL)) {
    return false;
  }
  return apiErrorBody(error)?.error.code !== 'invalid-credentials';
}
