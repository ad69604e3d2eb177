import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Store } from '@ngrx/store';
import { hasAnyRole, Role } from '@shared/auth';
import { map } from 'rxjs';
import { sessionUser } from './signed-in-guard';

/** Lets through people holding one of `allowed`; others see the "not allowed" page. */
export function roleGuard(allowed: readonly Role[]): CanActivateFn {
  return () => {
    const router = inject(Router);
    return sessionUser(inject(Store)).pipe(
      map((user) => {
        if (!user) {
          return router.createUrlTree(['/sign-in']);
        }
        return hasAnyRole(user.roles, allowed) || router.createUrlTree(['/not-allowed']);
      }),
    );
  };
}
