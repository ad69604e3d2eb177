import { inject } from '@angular/core';
import { Actions, createEffect, ofType } from '@ngrx/effects';
import { catchError, exhaustMap, map, of, switchMap, tap } from 'rxjs';
import { apiErrorMessage, apiFieldErrors } from '@app/core/api-error-message';
import { Notifier } from '@app/core/notifier';
import { ProfileClient } from '../profile-client';
import { ProfileApiActions } from './profile-api.actions';
import { ProfilePageActions } from './profile-page.actions';

export const loadProfile = createEffect(
  (actions$ = inject(Actions), client = inject(ProfileClient)) =>
    actions$.pipe(
      ofType(ProfilePageActions.opened),
      switchMap(() =>
        client.load().pipe(
          map((profile) => ProfileApiActions.profileLoadedSuccess({ profile })),
          catchError((error: unknown) => of(ProfileApiActions.profileLoadedFailure({ message: apiErrorMessage(error, 'Your profile could not be loaded.') }))),
        ),
      ),
    ),
  { functional: true },
);

export const saveProfile = createEffect(
  (actions$ = inject(Actions), client = inject(ProfileClient)) =>
    actions$.pipe(
      ofType(ProfilePageActions.detailsSubmitted),
      exhaustMap(({ request }) =>
        client.update(request).pipe(
          map((profile) => ProfileApiActions.profileSavedSuccess({ profile })),
          catchError((error: unknown) =>
            of(ProfileApiActions.profileSavedFailure({ message: apiErrorMessage(error, 'Your profile could not be saved.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const changePassword = createEffect(
  (actions$ = inject(Actions), client = inject(ProfileClient)) =>
    actions$.pipe(
      ofType(ProfilePageActions.passwordChangeSubmitted),
      exhaustMap(({ request }) =>
        client.changePassword(request).pipe(
          map(() => ProfileApiActions.passwordChangedSuccess()),
          catchError((error: unknown) =>
            of(ProfileApiActions.passwordChangedFailure({ message: apiErrorMessage(error, 'Your password could not be changed.'), fields: apiFieldErrors(error) })),
          ),
        ),
      ),
    ),
  { functional: true },
);

export const showOutcome = createEffect(
  (actions$ = inject(Actions), notifier = inject(Notifier)) =>
    actions$.pipe(
      ofType(ProfileApiActions.profileSavedSuccess, ProfileApiActions.passwordChangedSuccess, ProfileApiActions.profileSavedFailure,
        ProfileApiActions.passwordChangedFailure),
      tap((action) => notifier.notify(outcomeMessage(action))),
    ),
  { functional: true, dispatch: false },
);

function outcomeMessage(action: { type: string; message?: string }): string {
  if (action.type === ProfileApiActions.profileSavedSuccess.type) return 'Your profile is saved.';
  if (action.type === ProfileApiActions.passwordChangedSuccess.type) return 'Password changed; your other sessions are signed out.';
  return action.message ?? 'That did not work.';
}
