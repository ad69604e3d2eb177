import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('other_additions', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    table.enu('kind', ['spice', 'fining', 'water agent', 'flavouring', 'other']).notNullable();
    table.dateTime('retired_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('other_additions');
}
