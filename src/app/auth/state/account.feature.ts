import { createFeature, createReducer, on } from '@ngrx/store';
import { InvitationPreview } from '@shared/auth';
import { AcceptInvitationPageActions } from './accept-invitation-page.actions';
import { FieldErrors } from '@app/ui/server-field-errors';
import { AuthApiActions } from './auth-api.actions';
import { ForgotPasswordPageActions } from './forgot-password-page.actions';
import { ResetPasswordPageActions } from './reset-password-page.actions';

export type InvitationStatus = 'loading' | 'ready' | 'not-found' | 'failed';

/** State of the signed-out account pages: invitation, forgotten password, password reset. */
export interface AccountState {
  invitation: InvitationPreview | null;
  invitationStatus: InvitationStatus;
  submitting: boolean;
  error: string | null;
  /** Reasons per field from a 400 answer to the invitation form. */
  fieldErrors: FieldErrors | null;
  resetRequested: boolean;
}

export const initialAccountState: AccountState = {
  invitation: null,
  invitationStatus: 'loading',
  submitting: false,
  error: null,
  fieldErrors: null,
  resetRequested: false,
};

export const accountFeature = createFeature({
  name: 'account',
  reducer: createReducer(
    initialAccountState,
    on(
      AcceptInvitationPageActions.opened,
      ForgotPasswordPageActions.opened,
      ResetPasswordPageActions.opened,
      (): AccountState => initialAccountState,
    ),
    on(AuthApiActions.invitationLoadedSuccess, (state, { invitation }): AccountState => ({
      ...state,
      invitation,
      invitationStatus: 'ready',
    })),
    on(AuthApiActions.invitationLoadedFailure, (state, { message, notFound }): AccountState => ({
      ...state,
      invitationStatus: notFound ? 'not-found' : 'failed',
      error: message,
    })),
    on(
      AcceptInvitationPageActions.submitted,
      ForgotPasswordPageActions.submitted,
      ResetPasswordPageActions.submitted,
      (state): AccountState => ({ ...state, submitting: true, error: null, fieldErrors: null }),
    ),
    on(AuthApiActions.invitationAcceptedSuccess, AuthApiActions.passwordResetSuccess, (state): AccountState => ({
      ...state,
      submitting: false,
    })),
    on(AuthApiActions.resetRequestedSuccess, (state): AccountState => ({
      ...state,
      submitting: false,
      resetRequested: true,
    })),
    on(AuthApiActions.invitationAcceptedFailure, (state, { message, fields }): AccountState => ({
      ...state,
      submitting: false,
      error: message,
      fieldErrors: fields,
    })),
    on(
      AuthApiActions.resetRequestedFailure,
      AuthApiActions.passwordResetFailure,
      (state, { message }): AccountState => ({ ...state, submitting: false, error: message }),
    ),
  ),
});
