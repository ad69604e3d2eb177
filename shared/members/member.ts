import { Role } from '../auth/role';

/** A person of the co-op as officers see them on the Members page. */
export interface Member {
  id: number;
  email: string;
  name: string;
  roles: Role[];
  active: boolean;
  createdAt: string;
  /** When the person last asked for a password reset that is still open, if ever. */
  passwordResetRequestedAt: string | null;
}

/** A pending invitation. `link` is only present in the answer that created it. */
export interface Invitation {
  id: number;
  email: string;
  roles: Role[];
  invitedBy: string;
  createdAt: string;
  expiresAt: string;
  link?: string;
}
