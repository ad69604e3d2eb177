import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { ChangePasswordRequest, UpdateProfileRequest } from '@shared/profile';

export const ProfilePageActions = createActionGroup({
  source: 'Profile Page',
  events: {
    Opened: emptyProps(),
    'Details Submitted': props<{ request: UpdateProfileRequest }>(),
    'Password Change Submitted': props<{ request: ChangePasswordRequest }>(),
  },
});
