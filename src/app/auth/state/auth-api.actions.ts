import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { InvitationPreview, SessionUser } from '@shared/auth';
import { FieldErrors } from '@app/ui/server-field-errors';

export const AuthApiActions = createActionGroup({
  source: 'Auth API',
  events: {
    'Session Loaded Success': props<{ user: SessionUser | null; coopTimeZone: string }>(),
    'Session Loaded Failure': props<{ message: string }>(),
    'Session Expired': emptyProps(),
    'Sign In Success': props<{ user: SessionUser; returnUrl: string }>(),
    'Sign In Failure': props<{ message: string; retryAfterSeconds: number | null; fields: FieldErrors | null }>(),
    'Sign Out Success': emptyProps(),
    'Sign Out Failure': props<{ message: string }>(),
    'Invitation Loaded Success': props<{ invitation: InvitationPreview }>(),
    'Invitation Loaded Failure': props<{ message: string; notFound: boolean }>(),
    'Invitation Accepted Success': props<{ user: SessionUser }>(),
    'Invitation Accepted Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Reset Requested Success': emptyProps(),
    'Reset Requested Failure': props<{ message: string }>(),
    'Password Reset Success': emptyProps(),
    'Password Reset Failure': props<{ message: string }>(),
  },
});
