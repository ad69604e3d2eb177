import type { Knex } from 'knex';

// The rows exactly as uploaded; a correction never writes here (see density_table_corrections).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('density_table_rows', (table) => {
    table.increments('id').primary();
    table.integer('density_table_id').unsigned().notNullable().references('density_tables.id').onDelete('CASCADE');
    table.integer('line').unsigned().notNullable();
    table.decimal('mass_percent', 9, 5).notNullable();
    table.decimal('density', 10, 5).notNullable();
    table.unique(['density_table_id', 'line']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('density_table_rows');
}
