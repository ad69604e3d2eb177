import { Knex } from 'knex';
import { Invitation } from '@shared/members';
import { InvitationRow } from '../db';

function pending(db: Knex, now: Date) {
  return db('invitations').whereNull('accepted_at').whereNull('revoked_at').where('expires_at', '>', now);
}

function toInvitation(row: InvitationRow & { invited_by_name: string }): Invitation {
  return {
    id: row.id,
    email: row.email,
    roles: row.roles,
    invitedBy: row.invited_by_name,
    createdAt: row.created_at.toISOString(),
    expiresAt: row.expires_at.toISOString(),
  };
}

/** Data access for invitations; tokens are stored only as hashes. */
export const invitationsRepository = {
  async insert(db: Knex, row: Pick<InvitationRow, 'email' | 'roles' | 'token_hash' | 'invited_by_user_id' | 'expires_at'>): Promise<number> {
    const [id] = await db('invitations').insert({ ...row, roles: JSON.stringify(row.roles) });
    return id;
  },

  async listPending(db: Knex, now: Date): Promise<Invitation[]> {
    const rows = await pending(db, now)
      .join('users', 'users.id', 'invitations.invited_by_user_id')
      .orderBy('invitations.created_at', 'desc')
      .select('invitations.*', 'users.name as invited_by_name');
    return rows.map(toInvitation);
  },

  async findPendingById(db: Knex, id: number, now: Date): Promise<Invitation | null> {
    const row = await pending(db, now)
      .where('invitations.id', id)
      .join('users', 'users.id', 'invitations.invited_by_user_id')
      .first('invitations.*', 'users.name as invited_by_name');
    return row ? toInvitation(row) : null;
  },

  /** The pending invitation behind a token, locked when read inside a transaction. */
  async findPendingByTokenHash(db: Knex, tokenHash: string, now: Date, lock = false): Promise<InvitationRow | null> {
    const query = pending(db, now).where({ token_hash: tokenHash });
    const row = await (lock ? query.forUpdate() : query).first();
    return row ?? null;
  },

  async revokePendingForEmail(db: Knex, email: string, now: Date): Promise<void> {
    await pending(db, now).where({ email }).update({ revoked_at: now });
  },

  /** Withdraws pending invitations sent by the person or to their address (on deactivation). */
  async revokePendingOf(db: Knex, userId: number, email: string, now: Date): Promise<void> {
    await pending(db, now)
      .where((q) => q.where({ invited_by_user_id: userId }).orWhere({ email }))
      .update({ revoked_at: now });
  },

  async update(db: Knex, id: number, changes: Partial<Pick<InvitationRow, 'accepted_at' | 'revoked_at'>>): Promise<void> {
    await db('invitations').where({ id }).update(changes);
  },
};
