import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { Store } from '@ngrx/store';
import { map } from 'rxjs';
import { sessionUser } from './signed-in-guard';

/** Sends a person who is already signed in from the sign-in page to Today. */
export const signedOutGuard: CanActivateFn = () => {
  const router = inject(Router);
  return sessionUser(inject(Store)).pipe(map((user) => user === null || router.createUrlTree(['/today'])));
};
