import { HttpErrorResponse } from '@angular/common/http';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { ProfileClient } from '../profile-client';
import { ProfileApiActions } from './profile-api.actions';
import { ProfilePageActions } from './profile-page.actions';
import { changePassword, saveProfile } from './profile.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof ProfileClient, (...args: never[]) => Observable<unknown>>>) => overrides as unknown as ProfileClient;

describe('profile effects', () => {
  it('saveProfile sends the details and passes on the saved profile', async () => {
    const profile = { name: 'Priya Raman', email: 'priya@test.example', unitSystem: 'us' as const };
    const update = jest.fn(() => of(profile));

    const result = await firstValueFrom(
      saveProfile(actionsOf(ProfilePageActions.detailsSubmitted({ request: { name: 'Priya Raman', unitSystem: 'us' } })), fakeClient({ update })),
    );

    expect(update).toHaveBeenCalledWith({ name: 'Priya Raman', unitSystem: 'us' });
    expect(result).toEqual(ProfileApiActions.profileSavedSuccess({ profile }));
  });

  it('changePassword passes on the field the server refused (a wrong current password)', async () => {
    const refusal = new HttpErrorResponse({
      status: 400,
      error: { error: { code: 'validation-failed', message: 'Please check these fields: currentPassword.' }, fields: { currentPassword: 'does not match your password' } },
    });
    const client = fakeClient({ changePassword: () => throwError(() => refusal) });

    const result = await firstValueFrom(
      changePassword(actionsOf(ProfilePageActions.passwordChangeSubmitted({ request: { currentPassword: 'wrong', newPassword: 'a new passphrase' } })), client),
    );

    expect(result).toEqual(
      ProfileApiActions.passwordChangedFailure({ message: 'Please check these fields: currentPassword.', fields: { currentPassword: 'does not match your password' } }),
    );
  });
});
