import { Knex } from 'knex';
import { BatchPushTokenRow } from '../db';

/** Data access for logger push tokens. */
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
};
