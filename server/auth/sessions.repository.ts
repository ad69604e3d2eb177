import { Knex } from 'knex';
import { SessionData } from 'express-session';

/** Data access for stored sessions (sid, JSON body, expiry). */
export const sessionsRepository = {
  async find(db: Knex, sid: string, now: Date): Promise<SessionData | null> {
    const row = await db('sessions').where({ sid }).where('expired', '>', now).first('sess');
    if (!row) return null;
    return (typeof row.sess === 'string' ? JSON.parse(row.sess) : row.sess) as SessionData;
  },

  async save(db: Knex, sid: string, sess: SessionData, expires: Date): Promise<void> {
    await db('sessions').insert({ sid, sess: JSON.stringify(sess), expired: expires }).onConflict('sid').merge(['sess', 'expired']);
  },

  async touch(db: Knex, sid: string, expires: Date): Promise<void> {
    await db('sessions').where({ sid }).update({ expired: expires });
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
