import { createActionGroup, props } from '@ngrx/store';
import { Role } from '@shared/auth';

/** What the officer said yes to (or needed no question for): only these reach the server. */
export const MemberChangeConfirmationActions = createActionGroup({
  source: 'Member Change Confirmation',
  events: {
    'Roles Change Confirmed': props<{ memberId: number; roles: Role[] }>(),
    'Active Change Confirmed': props<{ memberId: number; active: boolean }>(),
    'Revocation Confirmed': props<{ invitationId: number }>(),
  },
});
