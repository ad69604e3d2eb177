import { Knex } from 'knex';

/** Data access for the private calendar-feed links (one per person, stored as a hash). */
export const feedLinksRepository = {
  async findByUser(db: Knex, userId: number): Promise<{ createdAt: Date } | null> {
    const row = await db('booking_feed_links').where({ user_id: userId }).first('created_at');
    return row ? { createdAt: row.created_at } : null;
  },

  async userIdForHash(db: Knex, tokenHash: string): Promise<number | null> {
    const row = await db('booking_feed_links')
      .join('users', 'users.id', 'booking_feed_links.user_id')
      .where('booking_feed_links.token_hash', tokenHash)
      .where('users.active', true)
      .first('booking_feed_links.user_id');
    return row?.user_id ?? null;
  },

  /** Replaces any earlier link, so the old address stops working at once. */
  async replace(db: Knex, userId: number, tokenHash: string): Promise<void> {
    await db('booking_feed_links').where({ user_id: userId }).delete();
    await db('booking_feed_links').insert({ user_id: userId, token_hash: tokenHash });
  },

  async remove(db: Knex, userId: number): Promise<void> {
    await db('booking_feed_links').where({ user_id: userId }).delete();
  },
};
