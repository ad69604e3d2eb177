import { Role } from './role';
import { SessionUser } from './session-user';

export const AUTH_PATH = '/api/auth';
export const INVITATIONS_PATH = '/api/invitations';
export const PASSWORD_RESETS_PATH = '/api/password-resets';

/** Minimum password length, enforced on both sides. */
export const PASSWORD_MIN_LENGTH = 10;

/** POST /api/auth/sign-in */
export interface SignInRequest {
  email: string;
  password: string;
}

/** GET /api/auth/session, POST /api/auth/sign-in: `user` is null when nobody is signed in. */
export interface SessionResponse {
  user: SessionUser | null;
}

/** GET /api/auth/session: also carries the co-op's time zone, in which the client shows dates. */
export interface SessionProbeResponse extends SessionResponse {
  coopTimeZone: string;
}

/** GET /api/invitations/:token (public): what the invited person sees before accepting. */
export interface InvitationPreview {
  email: string;
  roles: Role[];
  expiresAt: string;
}

/** POST /api/invitations/:token/acceptance (public) */
export interface AcceptInvitationRequest {
  name: string;
  password: string;
}

/** POST /api/password-resets/requests (public): always answers 202, whether or not the e-mail is known. */
export interface PasswordResetRequest {
  email: string;
}

/** POST /api/password-resets (public): sets a new password with a reset token. */
export interface CompletePasswordResetRequest {
  token: string;
  password: string;
}
