import type { Knex } from 'knex';

// A booking may name the batch it serves; the link must point at a batch that exists.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bookings', (table) => {
    table.foreign('batch_id').references('id').inTable('batches');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('bookings', (table) => {
    table.dropForeign(['batch_id']);
  });
}
