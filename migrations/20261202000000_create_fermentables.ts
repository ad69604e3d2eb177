import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('fermentables', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    table.enu('kind', ['grain', 'extract', 'sugar', 'adjunct']).notNullable();
    table.double('extract_percent').notNullable();
    table.double('colour_lovibond').notNullable();
    table.double('max_share_percent').nullable();
    table.dateTime('retired_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('fermentables');
}
