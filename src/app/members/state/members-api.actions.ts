import { createActionGroup, props } from '@ngrx/store';
import { Invitation, IssuedPasswordReset, Member, MemberListResponse } from '@shared/members';
import { FieldErrors } from '@app/ui/server-field-errors';

export const MembersApiActions = createActionGroup({
  source: 'Members API',
  events: {
    'Members Loaded Success': props<{ response: MemberListResponse }>(),
    'Members Loaded Failure': props<{ message: string }>(),
    'Member Updated Success': props<{ member: Member }>(),
    'Member Updated Failure': props<{ memberId: number; message: string }>(),
    'Reset Link Issued Success': props<{ memberId: number; reset: IssuedPasswordReset }>(),
    'Reset Link Issued Failure': props<{ memberId: number; message: string }>(),
    'Invitation Created Success': props<{ invitation: Invitation }>(),
    'Invitation Created Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Invitation Revoked Success': props<{ invitationId: number }>(),
    'Invitation Revoked Failure': props<{ message: string }>(),
  },
});
