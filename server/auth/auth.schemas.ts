import { z } from 'zod';
import { PASSWORD_MIN_LENGTH } from '@shared/auth';

export const emailField = z.email('must be an e-mail address').max(254, 'must be at most 254 characters').transform((email) => email.toLowerCase());

/** A new password: long enough to resist guessing, short enough for bcrypt's 72-byte input. */
export const newPasswordField = z
  .string('must be text')
  .min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(72, 'must be at most 72 characters');

export const signInSchema = z.object({
  email: emailField,
  password: z.string('must be text').min(1, 'must not be empty').max(200, 'must be at most 200 characters'),
});
