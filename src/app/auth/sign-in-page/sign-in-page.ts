import { ChangeDetectionStrategy, Component, inject, input, OnInit } from '@angular/core';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { SignInRequest } from '@shared/auth';
import { PublicFrame } from '@app/ui/public-frame/public-frame';
import { SignInForm } from '../sign-in-form/sign-in-form';
import { authFeature } from '../state/auth.feature';
import { SignInPageActions } from '../state/sign-in-page.actions';

@Component({
  selector: 'cw-sign-in-page',
  imports: [PublicFrame, SignInForm, RouterLink],
  templateUrl: './sign-in-page.html',
  styleUrl: './sign-in-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInPage implements OnInit {
  private readonly store = inject(Store);

  /** Where the person was going before being asked to sign in (query parameter). */
  readonly returnUrl = input<string>();

  protected readonly signingIn = this.store.selectSignal(authFeature.selectSigningIn);
  protected readonly error = this.store.selectSignal(authFeature.selectSignInError);
  protected readonly retryAfterSeconds = this.store.selectSignal(authFeature.selectRetryAfterSeconds);
  protected readonly fieldErrors = this.store.selectSignal(authFeature.selectSignInFieldErrors);

  ngOnInit(): void {
    this.store.dispatch(SignInPageActions.opened());
  }

  protected signIn(credentials: SignInRequest): void {
    this.store.dispatch(SignInPageActions.submitted({ credentials, returnUrl: this.returnUrl() ?? '/today' }));
  }
}
