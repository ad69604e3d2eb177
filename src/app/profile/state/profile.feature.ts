import { createFeature, createReducer, on } from '@ngrx/store';
import { Profile } from '@shared/profile';
import { FieldErrors } from '@app/ui/server-field-errors';
import { ProfileApiActions } from './profile-api.actions';
import { ProfilePageActions } from './profile-page.actions';

export interface ProfileState {
  profile: Profile | null;
  loadError: string | null;
  savingDetails: boolean;
  detailsFieldErrors: FieldErrors | null;
  changingPassword: boolean;
  passwordFieldErrors: FieldErrors | null;
  /** Goes up by one per password changed; the form then clears. */
  passwordsChanged: number;
}

export const initialProfileState: ProfileState = {
  profile: null,
  loadError: null,
  savingDetails: false,
  detailsFieldErrors: null,
  changingPassword: false,
  passwordFieldErrors: null,
  passwordsChanged: 0,
};

export const profileFeature = createFeature({
  name: 'profile',
  reducer: createReducer(
    initialProfileState,
    on(ProfilePageActions.opened, (state): ProfileState => ({ ...state, loadError: null })),
    on(ProfileApiActions.profileLoadedSuccess, (state, { profile }): ProfileState => ({ ...state, profile })),
    on(ProfileApiActions.profileLoadedFailure, (state, { message }): ProfileState => ({ ...state, loadError: message })),
    on(ProfilePageActions.detailsSubmitted, (state): ProfileState => ({ ...state, savingDetails: true, detailsFieldErrors: null })),
    on(ProfileApiActions.profileSavedSuccess, (state, { profile }): ProfileState => ({ ...state, profile, savingDetails: false })),
    on(ProfileApiActions.profileSavedFailure, (state, { fields }): ProfileState => ({ ...state, savingDetails: false, detailsFieldErrors: fields })),
    on(ProfilePageActions.passwordChangeSubmitted, (state): ProfileState => ({ ...state, changingPassword: true, passwordFieldErrors: null })),
    on(ProfileApiActions.passwordChangedSuccess, (state): ProfileState => ({
      ...state,
      changingPassword: false,
      passwordsChanged: state.passwordsChanged + 1,
    })),
    on(ProfileApiActions.passwordChangedFailure, (state, { fields }): ProfileState => ({ ...state, changingPassword: false, passwordFieldErrors: fields })),
  ),
});
