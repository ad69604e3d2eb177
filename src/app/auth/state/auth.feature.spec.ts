import { MembersApiActions } from '@app/members/state/members-api.actions';
import { generateMockMember } from '@app/testing/member-mock';
import { generateMockSessionUser } from '@app/testing/session-user-mock';
import { AuthApiActions } from './auth-api.actions';
import { authFeature, AuthState, initialAuthState } from './auth.feature';
import { SignInPageActions } from './sign-in-page.actions';

const { reducer } = authFeature;

describe('authFeature reducer', () => {
  it('marks the session loaded with the user from the start-up probe', () => {
    const user = generateMockSessionUser();

    const state = reducer(initialAuthState, AuthApiActions.sessionLoadedSuccess({ user, coopTimeZone: 'Europe/Berlin' }));

    expect(state).toEqual({ ...initialAuthState, user, coopTimeZone: 'Europe/Berlin', sessionLoaded: true });
  });

  it('marks the session loaded without a user when the probe fails', () => {
    const state = reducer(initialAuthState, AuthApiActions.sessionLoadedFailure({ message: 'Down.' }));

    expect(state.sessionLoaded).toBe(true);
    expect(state.user).toBeNull();
  });

  it('clears an earlier refusal and waits when the sign-in form is submitted', () => {
    const before: AuthState = { ...initialAuthState, signInError: 'Wrong.', retryAfterSeconds: 30 };

    const state = reducer(
      before,
      SignInPageActions.submitted({ credentials: { email: 'a@b.example', password: 'x' }, returnUrl: '/today' }),
    );

    expect(state).toMatchObject({ signingIn: true, signInError: null, retryAfterSeconds: null });
  });

  it('keeps the message and the wait of a refused sign-in', () => {
    const before: AuthState = { ...initialAuthState, signingIn: true };

    const state = reducer(before, AuthApiActions.signInFailure({ message: 'Too many attempts.', retryAfterSeconds: 120, fields: null }));

    expect(state).toMatchObject({ signingIn: false, signInError: 'Too many attempts.', retryAfterSeconds: 120 });
  });

  it('stores the person after an accepted invitation', () => {
    const user = generateMockSessionUser(['member', 'brewer']);

    const state = reducer(initialAuthState, AuthApiActions.invitationAcceptedSuccess({ user }));

    expect(state.user).toEqual(user);
    expect(state.sessionLoaded).toBe(true);
  });

  it('follows a change an admin made to their own roles on the Members page', () => {
    const me = generateMockSessionUser(['member', 'admin'], { id: 21 });
    const signedIn: AuthState = { ...initialAuthState, sessionLoaded: true, user: me };

    const state = reducer(signedIn, MembersApiActions.memberUpdatedSuccess({ member: generateMockMember({ id: 21, roles: ['member'] }) }));

    expect(state.user?.roles).toEqual(['member']);
  });

  it('ignores a change made to someone else', () => {
    const signedIn: AuthState = { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser(['admin'], { id: 1 }) };

    const state = reducer(signedIn, MembersApiActions.memberUpdatedSuccess({ member: generateMockMember({ id: 21 }) }));

    expect(state).toBe(signedIn);
  });

  it('forgets the person on sign-out and on an expired session', () => {
    const signedIn: AuthState = { ...initialAuthState, sessionLoaded: true, user: generateMockSessionUser() };

    expect(reducer(signedIn, AuthApiActions.signOutSuccess()).user).toBeNull();
    expect(reducer(signedIn, AuthApiActions.sessionExpired())).toEqual({ ...initialAuthState, sessionLoaded: true });
  });
});

describe('authFeature selectors', () => {
  it('selectIsAdmin is true only when the person holds the admin role', () => {
    const admin = { auth: { ...initialAuthState, user: generateMockSessionUser(['member', 'admin']) } };
    const member = { auth: { ...initialAuthState, user: generateMockSessionUser(['member']) } };

    expect(authFeature.selectIsAdmin(admin)).toBe(true);
    expect(authFeature.selectIsAdmin(member)).toBe(false);
  });

  it('selectRoles is empty when nobody is signed in', () => {
    expect(authFeature.selectRoles({ auth: initialAuthState })).toEqual([]);
  });
});
