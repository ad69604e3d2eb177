import type { Knex } from 'knex';

// Product classes with the tolerance (± % vol) a declared strength is held to; set by admins.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('tolerance_classes', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    table.decimal('tolerance_percent_volume', 5, 2).notNullable();
    table.string('note', 300).notNullable().defaultTo('');
    table.boolean('retired').notNullable().defaultTo(false);
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('tolerance_classes');
}
