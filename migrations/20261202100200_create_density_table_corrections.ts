import type { Knex } from 'knex';

// Corrections of a table row, appended; the latest one is in use and the uploaded value stays.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('density_table_corrections', (table) => {
    table.increments('id').primary();
    table.integer('density_table_row_id').unsigned().notNullable().references('density_table_rows.id').onDelete('CASCADE');
    table.decimal('density', 10, 5).notNullable();
    table.string('note', 300).notNullable().defaultTo('');
    table.integer('corrected_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.index(['density_table_row_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('density_table_corrections');
}
