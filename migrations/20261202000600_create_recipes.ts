import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipes', (table) => {
    table.increments('id').primary();
    table.integer('owner_user_id').unsigned().notNullable().references('users.id');
    table.string('name', 100).notNullable();
    table.enu('visibility', ['private', 'coop']).notNullable().defaultTo('private');
    table.integer('current_version').unsigned().notNullable().defaultTo(1);
    table.integer('cloned_from_recipe_id').unsigned().nullable().references('recipes.id');
    table.dateTime('archived_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.index(['owner_user_id']);
    table.index(['visibility']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipes');
}
