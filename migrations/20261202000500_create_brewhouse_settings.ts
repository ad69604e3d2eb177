import type { Knex } from 'knex';

// One row per co-op (id 1): the settings are read and written whole.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('brewhouse_settings', (table) => {
    table.integer('id').unsigned().primary();
    table.json('settings').notNullable();
    table.integer('updated_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('brewhouse_settings');
}
