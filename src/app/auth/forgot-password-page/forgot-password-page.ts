import { ChangeDetectionStrategy, Component, inject, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { PublicFrame } from '@app/ui/public-frame/public-frame';
import { ForgotPasswordForm } from '../forgot-password-form/forgot-password-form';
import { accountFeature } from '../state/account.feature';
import { ForgotPasswordPageActions } from '../state/forgot-password-page.actions';

@Component({
  selector: 'cw-forgot-password-page',
  imports: [PublicFrame, ForgotPasswordForm, RouterLink],
  templateUrl: './forgot-password-page.html',
  styleUrl: './forgot-password-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPasswordPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly submitting = this.store.selectSignal(accountFeature.selectSubmitting);
  protected readonly error = this.store.selectSignal(accountFeature.selectError);
  protected readonly requested = this.store.selectSignal(accountFeature.selectResetRequested);

  ngOnInit(): void {
    this.store.dispatch(ForgotPasswordPageActions.opened());
  }

  protected requestReset(email: string): void {
    this.store.dispatch(ForgotPasswordPageActions.submitted({ email }));
  }
}
