import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('stock_draw_lines', (table) => {
    table.increments('id').primary();
    table.integer('stock_draw_id').unsigned().notNullable().references('stock_draws.id');
    table.integer('ingredient_id').unsigned().notNullable().references('ingredients.id');
    table.enu('unit', ['kg', 'L', 'each']).notNullable();
    table.decimal('needed', 16, 6).notNullable();
    table.decimal('drawn', 16, 6).notNullable();
    table.decimal('shortfall', 16, 6).notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('stock_draw_lines');
}
