import { Knex } from 'knex';

/** The count of a key in its current window and the time left of that window. */
export interface CounterState {
  points: number;
  msLeft: number;
}

// Times come from the database clock only, so processes on machines with drifting clocks agree.
const INCREMENT = `
  INSERT INTO request_counters (counter_key, points, expires_at)
  VALUES (?, 1, NOW(3) + INTERVAL ? MICROSECOND)
  ON DUPLICATE KEY UPDATE
    points = IF(expires_at <= NOW(3), 1, points + 1),
    expires_at = IF(expires_at <= NOW(3), VALUES(expires_at), expires_at)`;

/** Data access for rate-limit counters: one row per key, counted by an atomic upsert. */
export const requestCountersRepository = {
  /** Adds one to the key (starting a new window when the old one ran out) and reads the result under the same row lock. */
  async increment(trx: Knex.Transaction, key: string, windowMs: number): Promise<CounterState> {
    await trx.raw(INCREMENT, [key, Math.round(windowMs * 1000)]);
    const [rows] = await trx.raw('SELECT points, TIMESTAMPDIFF(MICROSECOND, NOW(3), expires_at) AS us_left FROM request_counters WHERE counter_key = ?', [key]);
    const row = (rows as { points: number; us_left: number | string }[])[0];
    return { points: row.points, msLeft: Math.max(0, Number(row.us_left) / 1000) };
  },

  async remove(db: Knex, key: string): Promise<void> {
    await db('request_counters').where({ counter_key: key }).delete();
  },

  /** Deletes counters whose window has ended; returns how many. */
  async purgeExpired(db: Knex): Promise<number> {
    return db('request_counters').whereRaw('expires_at < NOW(3)').delete();
  },
};
