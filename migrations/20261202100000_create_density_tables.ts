import type { Knex } from 'knex';

// Reference density tables (% mass → density at one temperature) uploaded by brewers and audited.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('density_tables', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable();
    table.decimal('temperature_c', 6, 3).notNullable();
    table.decimal('resolution', 10, 5).notNullable();
    table.integer('uploaded_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('density_tables');
}
