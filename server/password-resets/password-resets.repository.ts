import { Knex } from 'knex';
import { PasswordResetRow } from '../db';

/** Data access for password-reset tokens (stored as hashes). */
export const passwordResetsRepository = {
  /** Replaces any unused token of the user with a new one. */
  async replace(db: Knex, row: Pick<PasswordResetRow, 'user_id' | 'token_hash' | 'issued_by_user_id' | 'expires_at'>, now: Date): Promise<void> {
    await db('password_resets').where({ user_id: row.user_id }).whereNull('used_at').update({ used_at: now });
    await db('password_resets').insert(row);
  },

  /** The unused, unexpired reset of an active member behind a token; locked when `lock` (inside a transaction). */
  async findUsable(db: Knex, tokenHash: string, now: Date, lock = false): Promise<PasswordResetRow | null> {
    const query = db('password_resets')
      .join('users', 'users.id', 'password_resets.user_id')
      .where('password_resets.token_hash', tokenHash)
      .where('users.active', true)
      .whereNull('password_resets.used_at')
      .where('password_resets.expires_at', '>', now)
      .select('password_resets.*');
    const row = await (lock ? query.forUpdate() : query).first();
    return row ?? null;
  },

  /** Spends every unused link for the member or issued by them (on deactivation). */
  async withdrawFor(db: Knex, userId: number, now: Date): Promise<void> {
    await db('password_resets')
      .whereNull('used_at')
      .where((q) => q.where({ user_id: userId }).orWhere({ issued_by_user_id: userId }))
      .update({ used_at: now });
  },

  async markUsed(db: Knex, id: number, now: Date): Promise<void> {
    await db('password_resets').where({ id }).update({ used_at: now });
  },

  /** Ends every session of the user, so a reset locks out whoever knew the old password. */
  async endSessionsOf(db: Knex, userId: number): Promise<void> {
    await db('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [String(userId)]).delete();
  },
};
