import { HttpErrorResponse } from '@angular/common/http';
import { Router } from '@angular/router';
import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, Observable, of, throwError } from 'rxjs';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { AuthClient } from '../auth-client';
import { acceptInvitation, completePasswordReset, loadInvitation, navigateAfterInvitationAccepted } from './account.effects';
import { AcceptInvitationPageActions } from './accept-invitation-page.actions';
import { AuthApiActions } from './auth-api.actions';
import { ResetPasswordPageActions } from './reset-password-page.actions';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeClient = (overrides: Partial<Record<keyof AuthClient, (...args: never[]) => Observable<unknown>>>) =>
  overrides as unknown as AuthClient;
const notFound = () => throwError(() => new HttpErrorResponse({ status: 404, error: { error: { code: 'invitation-not-found', message: 'Not found.' } } }));

describe('account effects', () => {
  it('loadInvitation maps the preview to Invitation Loaded Success', async () => {
    const invitation = { email: 'new@fernhollow.example', roles: ['member' as const], expiresAt: '2026-12-08T10:00:00Z' };
    const client = fakeClient({ invitation: jest.fn(() => of(invitation)) });

    const result = await firstValueFrom(loadInvitation(actionsOf(AcceptInvitationPageActions.opened({ token: 'tok' })), client));

    expect(result).toEqual(AuthApiActions.invitationLoadedSuccess({ invitation }));
    expect(client.invitation).toHaveBeenCalledWith('tok');
  });

  it('loadInvitation marks an unknown or used invitation as not found', async () => {
    const client = fakeClient({ invitation: notFound });

    const result = await firstValueFrom(loadInvitation(actionsOf(AcceptInvitationPageActions.opened({ token: 'old' })), client));

    expect(result).toMatchObject({ type: AuthApiActions.invitationLoadedFailure.type, notFound: true });
  });

  it('acceptInvitation sends name and password and maps the new session to Invitation Accepted Success', async () => {
    const user = generateMockSessionUser();
    const client = fakeClient({ acceptInvitation: jest.fn(() => of({ user })) });
    const action = AcceptInvitationPageActions.submitted({ token: 'tok', name: 'Priya Raman', password: 'long enough pw' });

    const result = await firstValueFrom(acceptInvitation(actionsOf(action), client));

    expect(client.acceptInvitation).toHaveBeenCalledWith('tok', { name: 'Priya Raman', password: 'long enough pw' });
    expect(result).toEqual(AuthApiActions.invitationAcceptedSuccess({ user }));
  });

  it('completePasswordReset explains an expired link on 404', async () => {
    const client = fakeClient({ completePasswordReset: notFound });
    const action = ResetPasswordPageActions.submitted({ token: 'gone', password: 'long enough pw' });

    const result = await firstValueFrom(completePasswordReset(actionsOf(action), client));

    expect(result).toEqual(
      AuthApiActions.passwordResetFailure({
        message: 'This reset link is unknown, has expired or has already been used. Ask for a new one.',
      }),
    );
  });

  it('navigateAfterInvitationAccepted lands on Today', async () => {
    const router = { navigate: jest.fn() } as unknown as Router;
    const action = AuthApiActions.invitationAcceptedSuccess({ user: generateMockSessionUser() });

    await firstValueFrom(navigateAfterInvitationAccepted(actionsOf(action), router));

    expect(router.navigate).toHaveBeenCalledWith(['/today']);
  });
});
