import { Knex } from 'knex';
import { Role, ROLES } from '@shared/auth';
import { UserRow } from '../db';

/** A user as the domain sees it (no password hash). */
export interface UserRecord {
  id: number;
  email: string;
  name: string;
  active: boolean;
  roles: Role[];
  passwordResetRequestedAt: Date | null;
  createdAt: Date;
}

function sortRoles(roles: Role[]): Role[] {
  return [...roles].sort((a, b) => ROLES.indexOf(a) - ROLES.indexOf(b));
}

async function rolesByUser(db: Knex, userIds: number[]): Promise<Map<number, Role[]>> {
  const rows = userIds.length ? await db('user_roles').whereIn('user_id', userIds) : [];
  const roles = new Map<number, Role[]>();
  for (const row of rows) roles.set(row.user_id, [...(roles.get(row.user_id) ?? []), row.role]);
  return roles;
}

function toRecord(row: UserRow, roles: Role[]): UserRecord {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    active: Boolean(row.active),
    roles: sortRoles(roles),
    passwordResetRequestedAt: row.password_reset_requested_at,
    createdAt: row.created_at,
  };
}

/** Data access for people and their roles. Every function takes a Knex or a transaction. */
export const usersRepository = {
  async findById(db: Knex, id: number): Promise<UserRecord | null> {
    const row = await db('users').where({ id }).first();
    return row ? toRecord(row, (await rolesByUser(db, [id])).get(id) ?? []) : null;
  },

  /** An active person with their roles in one query: read on every signed-in request. */
  async findActiveSessionUser(db: Knex, id: number): Promise<{ id: number; email: string; name: string; roles: Role[] } | null> {
    const row = await db('users')
      .leftJoin('user_roles', 'user_roles.user_id', 'users.id')
      .where('users.id', id)
      .where('users.active', true)
      .groupBy('users.id', 'users.email', 'users.name')
      .first('users.id', 'users.email', 'users.name', db.raw("GROUP_CONCAT(user_roles.role SEPARATOR ',') as roles"));
    if (!row) return null;
    const roles = row.roles ? (String(row.roles).split(',') as Role[]) : [];
    return { id: row.id, email: row.email, name: row.name, roles: sortRoles(roles) };
  },

  /** The user and their password hash, for checking a sign-in. */
  async findCredentials(db: Knex, email: string): Promise<{ user: UserRecord; passwordHash: string } | null> {
    const row = await db('users').where({ email: email.toLowerCase() }).first();
    if (!row) return null;
    const roles = (await rolesByUser(db, [row.id])).get(row.id) ?? [];
    return { user: toRecord(row, roles), passwordHash: row.password_hash };
  },

  async emailTaken(db: Knex, email: string): Promise<boolean> {
    return Boolean(await db('users').where({ email: email.toLowerCase() }).first('id'));
  },

  async list(db: Knex): Promise<UserRecord[]> {
    const rows = await db('users').orderBy('name');
    const roles = await rolesByUser(db, rows.map((row) => row.id));
    return rows.map((row) => toRecord(row, roles.get(row.id) ?? []));
  },

  async create(db: Knex, user: { email: string; name: string; passwordHash: string; roles: Role[] }): Promise<number> {
    const [id] = await db('users').insert({
      email: user.email.toLowerCase(),
      name: user.name,
      password_hash: user.passwordHash,
      active: true,
    });
    await db('user_roles').insert(user.roles.map((role) => ({ user_id: id, role })));
    return id;
  },

  async replaceRoles(db: Knex, userId: number, roles: Role[]): Promise<void> {
    await db('user_roles').where({ user_id: userId }).delete();
    await db('user_roles').insert(roles.map((role) => ({ user_id: userId, role })));
  },

  async update(db: Knex, userId: number, changes: Partial<Pick<UserRow, 'name' | 'active' | 'password_hash' | 'password_reset_requested_at' | 'unit_system'>>): Promise<void> {
    await db('users').where({ id: userId }).update({ ...changes, updated_at: new Date() });
  },

  async unitSystem(db: Knex, userId: number): Promise<UserRow['unit_system']> {
    return (await db('users').where({ id: userId }).first('unit_system'))?.unit_system ?? 'metric';
  },

  /** Active admins, locked for the rest of the transaction so two officers cannot both demote the last one. */
  async lockActiveAdminIds(trx: Knex.Transaction): Promise<number[]> {
    const rows = await trx('users')
      .join('user_roles', 'user_roles.user_id', 'users.id')
      .where('user_roles.role', 'admin')
      .where('users.active', true)
      .forUpdate()
      .select('users.id');
    return rows.map((row: { id: number }) => row.id);
  },
};
