import type { Knex } from 'knex';

// One delivery of one ingredient. The quantity on hand is kept on the lot for locking and quick
// reads, and only ever changed together with a row of stock_movements, which keeps the history;
// the CHECK is the last guard against going below zero.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stock_lots', (table) => {
    table.increments('id').primary();
    table.integer('ingredient_id').unsigned().notNullable().references('ingredients.id');
    table.enu('unit', ['kg', 'L', 'each']).notNullable();
    table.decimal('received_quantity', 16, 6).notNullable();
    table.decimal('quantity_on_hand', 16, 6).notNullable();
    table.date('received_on').notNullable();
    table.date('best_before').nullable();
    table.string('supplier_note', 500).notNullable().defaultTo('');
    table.integer('created_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['ingredient_id', 'unit']);
    table.check('?? >= 0', ['quantity_on_hand'], 'stock_lots_on_hand_not_negative');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stock_lots');
}
