import { Knex } from 'knex';
import { BatchPushTokenRow } from '../db';

/** Data access for logger push tokens and the push endpoint's rate windows. */
export const pushTokensRepository = {
  async list(db: Knex, batchId: number): Promise<BatchPushTokenRow[]> {
    return db('batch_push_tokens').where({ batch_id: batchId }).orderBy('id', 'desc');
  },

  async insert(trx: Knex, row: Pick<BatchPushTokenRow, 'batch_id' | 'label' | 'token_hash' | 'created_by_user_id'>): Promise<number> {
    const [id] = await trx('batch_push_tokens').insert(row);
    return id;
  },

  async findById(db: Knex, id: number): Promise<BatchPushTokenRow | undefined> {
    return db('batch_push_tokens').where({ id }).first();
  },

  async findByHash(db: Knex, hash: string): Promise<BatchPushTokenRow | undefined> {
    return db('batch_push_tokens').where({ token_hash: hash }).first();
  },

  async revoke(trx: Knex, id: number): Promise<void> {
    await trx('batch_push_tokens').where({ id }).whereNull('revoked_at').update({ revoked_at: new Date() });
  },

  async touch(db: Knex, id: number): Promise<void> {
    await db('batch_push_tokens').where({ id }).update({ last_used_at: new Date() });
  },

  /** Counts one hit in the key's current window and returns the window's total; older windows of the key are dropped. */
  async hit(trx: Knex.Transaction, key: string, windowStart: number): Promise<number> {
    await trx('push_rate_windows').where('rate_key', key).where('window_start', '<', windowStart).delete();
    await trx('push_rate_windows').insert({ rate_key: key, window_start: windowStart, hits: 1 }).onConflict(['rate_key', 'window_start']).merge({ hits: trx.raw('hits + 1') });
    const row = await trx('push_rate_windows').where({ rate_key: key, window_start: windowStart }).first('hits');
    return row?.hits ?? 1;
  },
};
