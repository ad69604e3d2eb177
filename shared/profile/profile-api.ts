import type { UnitSystem } from '../recipes/recipes-api';

/**
 * The signed-in person's own account.
 *   GET /api/profile              [any]  Profile
 *   PUT /api/profile              [any]  UpdateProfileRequest → Profile
 *   PUT /api/profile/password     [any]  ChangePasswordRequest → 204; the person's other sessions end
 */
export const PROFILE_PATH = '/api/profile';

/** Longest name a person may give, on both sides. */
export const PERSON_NAME_MAX_LENGTH = 100;

export interface Profile {
  name: string;
  email: string;
  unitSystem: UnitSystem;
}

export interface UpdateProfileRequest {
  name: string;
  unitSystem: UnitSystem;
}

export interface ChangePasswordRequest {
  currentPassword: string;
  newPassword: string;
}
