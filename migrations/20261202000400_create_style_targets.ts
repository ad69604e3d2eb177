import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('style_targets', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable().unique();
    for (const target of ['og', 'fg', 'abv', 'ibu', 'colour_srm']) {
      table.double(`${target}_min`).notNullable();
      table.double(`${target}_max`).notNullable();
    }
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('style_targets');
}
