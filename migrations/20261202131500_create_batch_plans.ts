import type { Knex } from 'knex';

// The schedule a batch was planned with on the brew plan (days of fermentation and conditioning),
// so the timeline shows the brewer's own plan rather than the defaults.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_plans', (table) => {
    table.integer('batch_id').unsigned().primary().references('id').inTable('batches');
    table.smallint('fermentation_days').unsigned().notNullable();
    table.smallint('conditioning_days').unsigned().notNullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_plans');
}
