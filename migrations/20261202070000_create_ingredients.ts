import type { Knex } from 'knex';

// One identity for every ingredient, whatever its kind, so stock, shopping lists and the index of
// recipe versions can point at any of them with one key.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('ingredients', (table) => {
    table.increments('id').primary();
    table.enu('kind', ['fermentables', 'hops', 'yeasts', 'others']).notNullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('ingredients');
}
