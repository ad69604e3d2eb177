import type { Knex } from 'knex';

// One private calendar-feed link per person; only the token's hash is kept, and deleting the row revokes it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('booking_feed_links', (table) => {
    table.integer('user_id').unsigned().primary().references('id').inTable('users');
    table.string('token_hash', 64).notNullable().unique();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('booking_feed_links');
}
