import { Knex } from 'knex';
import { SessionData } from 'express-session';

/** How far an expiry must move before a touch writes it. */
export const TOUCH_STEP_MS = 60_000;

/** Data access for stored sessions (sid, JSON body, expiry). */
export const sessionsRepository = {
  async find(db: Knex, sid: string, now: Date): Promise<SessionData | null> {
    const row = await db('sessions').where({ sid }).where('expired', '>', now).first('sess', 'expired');
    if (!row) return null;
    const sess = (typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess) as SessionData;
    return { ...sess, storedExpiryMs: row.expired.getTime() };
  },

  async save(db: Knex, sid: string, sess: SessionData, expires: Date): Promise<void> {
    const { storedExpiryMs: _read, ...kept } = sess;
    await db('sessions').insert({ sid, sess: JSON.stringify(kept), expired: expires }).onConflict('sid').merge(['sess', 'expired']);
  },

  /**
   * Moves the expiry forward only when it moved by more than TOUCH_STEP_MS: a rolling session is
   * touched on every request, and rewriting the row each time costs a write per read.
   */
  async touch(db: Knex, sid: string, expires: Date): Promise<void> {
    await db('sessions').where({ sid }).where('expired', '<', new Date(expires.getTime() - TOUCH_STEP_MS)).update({ expired: expires });
  },

  async remove(db: Knex, sid: string): Promise<void> {
    await db('sessions').where({ sid }).delete();
  },

  /** Ends every session of the user but the one given, so a changed password locks out other devices. */
  async endOthers(db: Knex, userId: number, keepSessionId: string): Promise<number> {
    return db('sessions').whereRaw("JSON_VALUE(sess, '$.passport.user') = ?", [String(userId)]).whereNot('sid', keepSessionId).delete();
  },

  /** Deletes sessions past their expiry; returns how many. */
  async purgeExpired(db: Knex, now: Date): Promise<number> {
    return db('sessions').where('expired', '<=', now).delete();
  },
};
