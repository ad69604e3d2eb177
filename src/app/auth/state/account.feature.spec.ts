import { AcceptInvitationPageActions } from './accept-invitation-page.actions';
import { accountFeature, AccountState, initialAccountState } from './account.feature';
import { AuthApiActions } from './auth-api.actions';
import { ForgotPasswordPageActions } from './forgot-password-page.actions';

const { reducer } = accountFeature;
const invitation = { email: 'new@fernhollow.example', roles: ['member' as const], expiresAt: '2026-12-08T10:00:00Z' };

describe('accountFeature reducer', () => {
  it('starts loading afresh when the invitation page opens, forgetting an earlier invitation', () => {
    const before: AccountState = { ...initialAccountState, invitation, invitationStatus: 'ready', error: 'Old.' };

    expect(reducer(before, AcceptInvitationPageActions.opened({ token: 't' }))).toEqual(initialAccountState);
  });

  it('keeps the preview once it arrives', () => {
    const state = reducer(initialAccountState, AuthApiActions.invitationLoadedSuccess({ invitation }));

    expect(state).toMatchObject({ invitation, invitationStatus: 'ready' });
  });

  it('tells a missing invitation from a failed load', () => {
    const missing = reducer(initialAccountState, AuthApiActions.invitationLoadedFailure({ message: 'Gone.', notFound: true }));
    const failed = reducer(initialAccountState, AuthApiActions.invitationLoadedFailure({ message: 'Down.', notFound: false }));

    expect([missing.invitationStatus, failed.invitationStatus]).toEqual(['not-found', 'failed']);
  });

  it('keeps the message and field reasons of a refused acceptance', () => {
    const submitting = reducer(
      { ...initialAccountState, invitation, invitationStatus: 'ready' },
      AcceptInvitationPageActions.submitted({ token: 't', name: 'P', password: 'long enough pw' }),
    );

    const state = reducer(
      submitting,
      AuthApiActions.invitationAcceptedFailure({ message: 'Check the form.', fields: { password: 'Too common.' } }),
    );

    expect(submitting.submitting).toBe(true);
    expect(state).toMatchObject({ submitting: false, error: 'Check the form.', fieldErrors: { password: 'Too common.' } });
  });

  it('records a sent reset request', () => {
    const submitting = reducer(initialAccountState, ForgotPasswordPageActions.submitted({ email: 'p@fernhollow.example' }));

    const state = reducer(submitting, AuthApiActions.resetRequestedSuccess());

    expect(state).toMatchObject({ submitting: false, resetRequested: true });
  });
});
