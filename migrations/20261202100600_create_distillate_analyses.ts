import type { Knex } from 'knex';

// Lab distillate analyses of a batch: what was measured, the table read, and the result as worked out then.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('distillate_analyses', (table) => {
    table.increments('id').primary();
    table.integer('batch_id').unsigned().notNullable().references('batches.id').onDelete('CASCADE');
    table.decimal('sample_volume_ml', 8, 3).notNullable();
    table.decimal('made_up_volume_ml', 8, 3).notNullable();
    table.decimal('distillate_density', 10, 5).notNullable();
    table.decimal('temperature_c', 5, 2).notNullable();
    table.decimal('density_resolution', 8, 5).notNullable();
    table.integer('density_table_id').unsigned().nullable().references('density_tables.id');
    table.json('result').notNullable();
    table.integer('analysed_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.index(['batch_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('distillate_analyses');
}
