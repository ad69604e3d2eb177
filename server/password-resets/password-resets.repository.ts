import { Knex } from 'knex';
import { PasswordResetRow } from '../db';

/** Data access for password-reset tokens (stored as hashes). */
export const passwordResetsRepository = {
  /** Replaces any unused token of the user with a new one. */
  async replace(db: Knex, row: Pick<PasswordResetRow, 'user_id' | 'token_hash' | 'issued_by_user_id' | 'expires_at'>, now: Date): Promise<void> {
    await db('password_resets').where({ user_id: row.user_id }).whereNull('used_at').update({ used_at: now });
    await db('password_resets').insert(row);
  },

  async lockUsable(trx: Knex.Transaction, tokenHash: string, now: Date): Promise<PasswordResetRow | null> {
    const row = await trx('password_resets')
      .where({ token_hash: tokenHash })
      .whereNull('used_at')
      .where('expires_at', '>', now)
      .forUpdate()
      .first();
    return row ?? null;
  },

  async markUsed(db: Knex, id: number, now: Date): Promise<void> {
    await db('password_resets').where({ id }).update({ used_at: now });
  },

  /** Ends every session of the user, so a reset locks out whoever knew the old password. */
  async endSessionsOf(db: Knex, userId: number): Promise<void> {
    await db('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [String(userId)]).delete();
  },
};
