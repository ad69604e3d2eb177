import { z } from 'zod';
import { ROLES } from '@shared/auth';
import { emailField, newPasswordField } from '../auth/auth.schemas';

export const rolesField = z
  .array(z.enum(ROLES, `must be one of ${ROLES.join(', ')}`), 'must be a list of roles')
  .min(1, 'must hold at least one role')
  .transform((roles) => ROLES.filter((role) => roles.includes(role)));

export const createInvitationSchema = z.object({ email: emailField, roles: rolesField });

export const acceptInvitationSchema = z.object({
  name: z.string('must be text').trim().min(1, 'must not be empty').max(100, 'must be at most 100 characters'),
  password: newPasswordField,
});

export const invitationTokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'is not an invitation token');
