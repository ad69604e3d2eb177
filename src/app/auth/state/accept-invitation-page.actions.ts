import { createActionGroup, props } from '@ngrx/store';

export const AcceptInvitationPageActions = createActionGroup({
  source: 'Accept Invitation Page',
  events: {
    Opened: props<{ token: string }>(),
    Submitted: props<{ token: string; name: string; password: string }>(),
  },
});
