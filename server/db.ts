import knex, { Knex } from 'knex';
import { join } from 'node:path';
import { Config } from './config';
import { Role } from '@shared/auth';
import { KitKind, KitState } from '@shared/kit';
import { RecipeDesign } from '@shared/recipes';

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

export interface RecipeRow {
  id: number;
  owner_user_id: number;
  name: string;
  visibility: 'private' | 'coop';
  current_version: number;
  cloned_from_recipe_id: number | null;
  archived_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

export interface RecipeVersionRow {
  id: number;
  recipe_id: number;
  version: number;
  design: RecipeDesign;
  created_by_user_id: number;
  created_at: Date;
}

export interface KitItemRow {
  id: number;
  code: string;
  name: string;
  kind: KitKind;
  /** DECIMAL: the driver returns a string. */
  capacity_litres: string | null;
  state: KitState;
  turnaround_hours: number;
  notes: string;
  created_at: Date;
  updated_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    users: Knex.CompositeTableType<UserRow, Omit<UserRow, 'id' | 'created_at' | 'updated_at' | 'password_reset_requested_at' | 'unit_system'>, Partial<UserRow>>;
    user_roles: UserRoleRow;
    invitations: Knex.CompositeTableType<InvitationRow, Omit<InvitationRow, 'id' | 'created_at' | 'accepted_at' | 'revoked_at' | 'roles'> & { roles: string }, Partial<InvitationRow>>;
    password_resets: Knex.CompositeTableType<PasswordResetRow, Omit<PasswordResetRow, 'id' | 'created_at' | 'used_at'>, Partial<PasswordResetRow>>;
    recipes: Knex.CompositeTableType<RecipeRow, Omit<RecipeRow, 'id' | 'created_at' | 'updated_at' | 'archived_at' | 'current_version'> & { current_version?: number }, Partial<RecipeRow>>;
    recipe_versions: Knex.CompositeTableType<RecipeVersionRow, Omit<RecipeVersionRow, 'id' | 'created_at' | 'design'> & { design: string }>;
    kit_items: Knex.CompositeTableType<KitItemRow, Omit<KitItemRow, 'id' | 'created_at' | 'updated_at' | 'state' | 'notes' | 'capacity_litres'> & { state?: KitState; notes?: string; capacity_litres: number | null }, Partial<Omit<KitItemRow, 'capacity_litres'>> & { capacity_litres?: number | null }>;
    audit_log: Knex.CompositeTableType<AuditLogRow, Omit<AuditLogRow, 'id' | 'created_at' | 'detail'> & { detail: string | null }>;
  }
}

export const MIGRATIONS_DIR = join(__dirname, '..', 'migrations');
export const SEEDS_DIR = join(__dirname, '..', 'seeds');

/** Knex settings for the configured database. */
export function knexConfig(db: Config['db']): Knex.Config {
  return {
    client: 'mysql2',
    connection: { ...db, charset: 'utf8mb4', timezone: 'Z', dateStrings: false },
    pool: { min: 0, max: 10 },
    migrations: { directory: MIGRATIONS_DIR, loadExtensions: ['.ts'], tableName: 'knex_migrations' },
    seeds: { directory: SEEDS_DIR, loadExtensions: ['.ts'] },
  };
}

/** Opens the connection pool; callers own `destroy()`. */
export function createDb(db: Config['db']): Knex {
  return knex(knexConfig(db));
}
