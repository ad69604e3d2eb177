import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { Store } from '@ngrx/store';
import { ChangePasswordRequest, UpdateProfileRequest } from '@shared/profile';
import { PasswordChangeForm } from '../password-change-form/password-change-form';
import { ProfileForm } from '../profile-form/profile-form';
import { ProfilePageActions } from '../state/profile-page.actions';
import { profileFeature } from '../state/profile.feature';

/** The signed-in person's own details and password. */
@Component({
  selector: 'cw-profile-page',
  imports: [ProfileForm, PasswordChangeForm],
  templateUrl: './profile-page.html',
  styleUrl: './profile-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProfilePage implements OnInit {
  private readonly store = inject(Store);

  protected readonly profile = this.store.selectSignal(profileFeature.selectProfile);
  protected readonly loadError = this.store.selectSignal(profileFeature.selectLoadError);
  protected readonly savingDetails = this.store.selectSignal(profileFeature.selectSavingDetails);
  protected readonly detailsFieldErrors = this.store.selectSignal(profileFeature.selectDetailsFieldErrors);
  protected readonly changingPassword = this.store.selectSignal(profileFeature.selectChangingPassword);
  protected readonly passwordFieldErrors = this.store.selectSignal(profileFeature.selectPasswordFieldErrors);
  protected readonly passwordsChanged = this.store.selectSignal(profileFeature.selectPasswordsChanged);

  ngOnInit(): void {
    this.store.dispatch(ProfilePageActions.opened());
  }

  protected saveDetails(request: UpdateProfileRequest): void {
    this.store.dispatch(ProfilePageActions.detailsSubmitted({ request }));
  }

  protected changePassword(request: ChangePasswordRequest): void {
    this.store.dispatch(ProfilePageActions.passwordChangeSubmitted({ request }));
  }
}
