import type { Knex } from 'knex';

// Plans the co-op offers for its dues; a plan is retired (inactive), never deleted, since payments name it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('dues_plans', (table) => {
    table.increments('id').primary();
    table.string('name', 60).notNullable().unique();
    table.integer('amount_cents').unsigned().notNullable();
    table.string('currency', 3).notNullable();
    table.enu('period', ['month', 'year']).notNullable();
    table.boolean('active').notNullable().defaultTo(true);
    table.integer('created_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('dues_plans');
}
