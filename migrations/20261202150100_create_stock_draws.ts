import type { Knex } from 'knex';

// A batch's bill taken from stock: one per batch (the unique key stops a second draw), with the
// lines needed, drawn and short, so an accepted shortfall is on record.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stock_draws', (table) => {
    table.increments('id').primary();
    table.integer('batch_id').unsigned().notNullable().unique().references('batches.id');
    table.boolean('shortfall_accepted').notNullable().defaultTo(false);
    table.integer('drawn_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stock_draws');
}
