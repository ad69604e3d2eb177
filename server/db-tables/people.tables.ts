import { Knex } from 'knex';
import { Role } from '@shared/auth';

// Who may sign in and what they did: people, their roles, invitations, reset links and the audit log.

export interface UserRow {
  id: number;
  email: string;
  name: string;
  password_hash: string;
  active: number | boolean;
  password_reset_requested_at: Date | null;
  unit_system: 'metric' | 'us';
  created_at: Date;
  updated_at: Date;
}

export interface UserRoleRow {
  user_id: number;
  role: Role;
}

export interface InvitationRow {
  id: number;
  email: string;
  roles: Role[];
  token_hash: string;
  invited_by_user_id: number;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
  created_at: Date;
}

export interface PasswordResetRow {
  id: number;
  user_id: number;
  token_hash: string;
  issued_by_user_id: number | null;
  expires_at: Date;
  used_at: Date | null;
  created_at: Date;
}

export interface AuditLogRow {
  id: number;
  actor_user_id: number | null;
  action: string;
  subject_type: string;
  subject_id: number | null;
  detail: Record<string, unknown> | null;
  created_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    users: Knex.CompositeTableType<UserRow, Omit<UserRow, 'id' | 'created_at' | 'updated_at' | 'password_reset_requested_at' | 'unit_system'>, Partial<UserRow>>;
    user_roles: UserRoleRow;
    invitations: Knex.CompositeTableType<InvitationRow, Omit<InvitationRow, 'id' | 'created_at' | 'accepted_at' | 'revoked_at' | 'roles'> & { roles: string }, Partial<InvitationRow>>;
    password_resets: Knex.CompositeTableType<PasswordResetRow, Omit<PasswordResetRow, 'id' | 'created_at' | 'used_at'>, Partial<PasswordResetRow>>;
    audit_log: Knex.CompositeTableType<AuditLogRow, Omit<AuditLogRow, 'id' | 'created_at' | 'detail'> & { detail: string | null }>;
  }
}
