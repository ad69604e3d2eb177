import type { Knex } from 'knex';

// The co-op's lab settings, one row (id 1): which density table the distillate analysis reads
// (null: the built-in OIML R 22 equation).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('lab_settings', (table) => {
    table.integer('id').unsigned().primary();
    table.integer('density_table_id').unsigned().nullable().references('density_tables.id');
    table.integer('updated_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('lab_settings');
}
