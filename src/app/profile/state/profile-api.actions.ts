import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { Profile } from '@shared/profile';
import { FieldErrors } from '@app/ui/server-field-errors';

export const ProfileApiActions = createActionGroup({
  source: 'Profile API',
  events: {
    'Profile Loaded Success': props<{ profile: Profile }>(),
    'Profile Loaded Failure': props<{ message: string }>(),
    'Profile Saved Success': props<{ profile: Profile }>(),
    'Profile Saved Failure': props<{ message: string; fields: FieldErrors | null }>(),
    'Password Changed Success': emptyProps(),
    'Password Changed Failure': props<{ message: string; fields: FieldErrors | null }>(),
  },
});
