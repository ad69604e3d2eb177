import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const ForgotPasswordPageActions = createActionGroup({
  source: 'Forgot Password Page',
  events: {
    Opened: emptyProps(),
    Submitted: props<{ email: string }>(),
  },
});
