import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('yeasts', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    table.double('attenuation_min_percent').notNullable();
    table.double('attenuation_max_percent').notNullable();
    table.double('temperature_min_c').notNullable();
    table.double('temperature_max_c').notNullable();
    table.enu('flocculation', ['low', 'medium', 'high']).notNullable();
    table.dateTime('retired_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('yeasts');
}
