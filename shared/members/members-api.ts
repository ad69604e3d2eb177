import { Role } from '../auth/role';
import { Invitation, Member } from './member';

export const MEMBERS_PATH = '/api/members';

/** GET /api/members (admin) */
export interface MemberListResponse {
  members: Member[];
  invitations: Invitation[];
}

/** PATCH /api/members/:memberId (admin): change roles and/or deactivate or reactivate. */
export interface UpdateMemberRequest {
  roles?: Role[];
  active?: boolean;
}

/** POST /api/invitations (admin) */
export interface CreateInvitationRequest {
  email: string;
  roles: Role[];
}

/** POST /api/members/:memberId/password-reset (admin): a one-time link to hand to the member. */
export interface IssuedPasswordReset {
  link: string;
  expiresAt: string;
}
