import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { PublicFrame } from '@app/ui/public-frame/public-frame';
import { ResetPasswordForm } from '../reset-password-form/reset-password-form';
import { accountFeature } from '../state/account.feature';
import { ResetPasswordPageActions } from '../state/reset-password-page.actions';

@Component({
  selector: 'cw-reset-password-page',
  imports: [PublicFrame, ResetPasswordForm, RouterLink],
  templateUrl: './reset-password-page.html',
  styleUrl: './reset-password-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordPage implements OnInit {
  private readonly store = inject(Store);

  /** The one-time reset token from the link (route parameter). */
  readonly token = input.required<string>();

  protected readonly submitting = this.store.selectSignal(accountFeature.selectSubmitting);
  protected readonly error = this.store.selectSignal(accountFeature.selectError);

  ngOnInit(): void {
    this.store.dispatch(ResetPasswordPageActions.opened());
  }

  protected savePassword(password: string): void {
    this.store.dispatch(ResetPasswordPageActions.submitted({ token: this.token(), password }));
  }
}
