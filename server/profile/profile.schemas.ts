import { z } from 'zod';
import { PERSON_NAME_MAX_LENGTH } from '@shared/profile';
import { UNIT_SYSTEMS } from '@shared/recipes';
import { newPasswordField } from '../auth/auth.schemas';

export const updateProfileSchema = z
  .object({
    name: z.string('must be text').trim().min(1, 'must not be empty').max(PERSON_NAME_MAX_LENGTH, `must be at most ${PERSON_NAME_MAX_LENGTH} characters`),
    unitSystem: z.enum(UNIT_SYSTEMS, `must be one of ${UNIT_SYSTEMS.join(', ')}`),
  })
  .strict();

export const changePasswordSchema = z
  .object({
    currentPassword: z.string('must be text').min(1, 'must not be empty').max(200, 'must be at most 200 characters'),
    newPassword: newPasswordField,
  })
  .strict();
