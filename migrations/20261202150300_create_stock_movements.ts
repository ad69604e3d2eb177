import type { Knex } from 'knex';

// Every change of a lot, added and never rewritten: receipts, draws for a batch, adjustments with
// their reason. The lot's quantity on hand is the running sum of these rows.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stock_movements', (table) => {
    table.increments('id').primary();
    table.integer('stock_lot_id').unsigned().notNullable().references('stock_lots.id');
    table.enu('kind', ['receipt', 'draw', 'adjustment']).notNullable();
    table.decimal('quantity_change', 16, 6).notNullable();
    table.decimal('on_hand_after', 16, 6).notNullable();
    table.integer('stock_draw_id').unsigned().nullable().references('stock_draws.id');
    table.enu('reason', ['spillage', 'count', 'spoilage', 'other']).nullable();
    table.string('note', 500).notNullable().defaultTo('');
    table.integer('user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['stock_lot_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stock_movements');
}
