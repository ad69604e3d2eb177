import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Store } from '@ngrx/store';
import { SessionUser } from '@shared/auth';
import { filter, map, Observable, take } from 'rxjs';
import { authFeature } from './state/auth.feature';

/** The signed-in person (or null), once the start-up session probe has answered. */
export function sessionUser(store: Store): Observable<SessionUser | null> {
  return store.select(authFeature.selectAuthState).pipe(
    filter((state) => state.sessionLoaded),
    take(1),
    map((state) => state.user),
  );
}

/** Lets signed-in people through; sends everyone else to sign in, remembering where they were going. */
export const signedInGuard: CanActivateFn = (_route, state) => {
  const router = inject(Router);
  return sessionUser(inject(Store)).pipe(
    map((user) => user !== null || router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } })),
  );
};
