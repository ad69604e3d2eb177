import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { SignInRequest } from '@shared/auth';

export const SignInPageActions = createActionGroup({
  source: 'Sign In Page',
  events: {
    Opened: emptyProps(),
    Submitted: props<{ credentials: SignInRequest; returnUrl: string }>(),
  },
});
