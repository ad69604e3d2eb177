import { createFeature, createReducer, createSelector, on } from '@ngrx/store';
import { Role, SessionUser } from '@shared/auth';
import { FieldErrors } from '@app/ui/server-field-errors';
import { MembersApiActions } from '@app/members/state/members-api.actions';
import { ProfileApiActions } from '@app/profile/state/profile-api.actions';
import { AuthApiActions } from './auth-api.actions';
import { SignInPageActions } from './sign-in-page.actions';

export interface AuthState {
  /** The signed-in person, or null. */
  user: SessionUser | null;
  /** False until the session probe at start-up has answered; guards wait for it. */
  sessionLoaded: boolean;
  signingIn: boolean;
  signInError: string | null;
  retryAfterSeconds: number | null;
  /** Reasons per sign-in field from a 400 answer. */
  signInFieldErrors: FieldErrors | null;
  /** IANA zone of the co-op from the session probe; dates are entered and shown in it. */
  coopTimeZone: string;
}

export const initialAuthState: AuthState = {
  user: null,
  sessionLoaded: false,
  signingIn: false,
  signInError: null,
  retryAfterSeconds: null,
  signInFieldErrors: null,
  coopTimeZone: 'UTC',
};

const noRoles: readonly Role[] = [];

export const authFeature = createFeature({
  name: 'auth',
  reducer: createReducer(
    initialAuthState,
    on(AuthApiActions.sessionLoadedSuccess, (state, { user, coopTimeZone }): AuthState => ({ ...state, user, coopTimeZone, sessionLoaded: true })),
    on(AuthApiActions.sessionLoadedFailure, (state): AuthState => ({ ...state, user: null, sessionLoaded: true })),
    on(ProfileApiActions.profileSavedSuccess, (state, { profile }): AuthState => ({
      ...state,
      user: state.user && { ...state.user, name: profile.name },
    })),
    on(SignInPageActions.opened, (state): AuthState => ({
      ...state,
      signInError: null,
      retryAfterSeconds: null,
      signInFieldErrors: null,
    })),
    on(SignInPageActions.submitted, (state): AuthState => ({
      ...state,
      signingIn: true,
      signInError: null,
      retryAfterSeconds: null,
      signInFieldErrors: null,
    })),
    on(AuthApiActions.signInSuccess, AuthApiActions.invitationAcceptedSuccess, (state, { user }): AuthState => ({
      ...state,
      user,
      sessionLoaded: true,
      signingIn: false,
    })),
    on(AuthApiActions.signInFailure, (state, { message, retryAfterSeconds, fields }): AuthState => ({
      ...state,
      signingIn: false,
      signInError: message,
      retryAfterSeconds,
      signInFieldErrors: fields,
    })),
    // An admin who changes their own roles sees the navigation follow at once.
    on(MembersApiActions.memberUpdatedSuccess, (state, { member }): AuthState =>
      state.user?.id === member.id
        ? { ...state, user: { ...state.user, name: member.name, email: member.email, roles: member.roles } }
        : state,
    ),
    on(AuthApiActions.signOutSuccess, AuthApiActions.sessionExpired, (state): AuthState => ({
      ...initialAuthState,
      coopTimeZone: state.coopTimeZone,
      sessionLoaded: true,
    })),
  ),
  extraSelectors: ({ selectUser }) => {
    const selectRoles = createSelector(selectUser, (user) => user?.roles ?? noRoles);
    return {
      selectRoles,
      selectIsSignedIn: createSelector(selectUser, (user) => user !== null),
      selectIsAdmin: createSelector(selectRoles, (roles) => roles.includes('admin')),
    };
  },
});
