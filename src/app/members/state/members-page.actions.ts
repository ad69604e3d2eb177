import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { Role } from '@shared/auth';
import { CreateInvitationRequest } from '@shared/members';

export const MembersPageActions = createActionGroup({
  source: 'Members Page',
  events: {
    Opened: emptyProps(),
    'Roles Changed': props<{ memberId: number; roles: Role[] }>(),
    'Active Changed': props<{ memberId: number; active: boolean }>(),
    'Reset Link Requested': props<{ memberId: number }>(),
    'Invitation Submitted': props<{ request: CreateInvitationRequest }>(),
    'Invitation Revoked': props<{ invitationId: number }>(),
    'Issued Link Copied': props<{ copied: boolean }>(),
    'Issued Link Dismissed': emptyProps(),
  },
});
