import type { Knex } from 'knex';

// The level at or below which an ingredient is flagged as low on Today, per unit it is counted in.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stock_reorder_levels', (table) => {
    table.integer('ingredient_id').unsigned().notNullable().references('ingredients.id');
    table.enu('unit', ['kg', 'L', 'each']).notNullable();
    table.decimal('reorder_level', 16, 6).notNullable();
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.primary(['ingredient_id', 'unit']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stock_reorder_levels');
}
