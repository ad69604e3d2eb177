import type { Knex } from 'knex';

// One imported CSV file: readings from it point here, so the log can say where they came from.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('reading_uploads', (table) => {
    table.increments('id').primary();
    table.integer('batch_id').unsigned().notNullable().references('batches.id').onDelete('CASCADE');
    table.string('file_name', 255).notNullable();
    table.enu('mode', ['all-or-nothing', 'good-rows-only']).notNullable();
    table.integer('rows_total').unsigned().notNullable();
    table.integer('rows_imported').unsigned().notNullable();
    table.integer('rows_duplicate').unsigned().notNullable();
    table.integer('rows_rejected').unsigned().notNullable();
    table.integer('created_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['batch_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('reading_uploads');
}
