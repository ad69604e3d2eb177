import type { Knex } from 'knex';

// Each save is a version; the design (items included) is kept whole so two versions compare exactly.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipe_versions', (table) => {
    table.increments('id').primary();
    table.integer('recipe_id').unsigned().notNullable().references('recipes.id').onDelete('CASCADE');
    table.integer('version').unsigned().notNullable();
    table.json('design').notNullable();
    table.integer('created_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.unique(['recipe_id', 'version']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_versions');
}
