import { createActionGroup, emptyProps, props } from '@ngrx/store';

export const ResetPasswordPageActions = createActionGroup({
  source: 'Reset Password Page',
  events: {
    Opened: emptyProps(),
    Submitted: props<{ token: string; password: string }>(),
  },
});
