import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('hops', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    table.double('alpha_acid_percent').notNullable();
    table.enu('form', ['pellet', 'whole', 'extract']).notNullable();
    table.dateTime('retired_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('hops');
}
