import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('password_resets', (table) => {
    table.increments('id').primary();
    table.integer('user_id').unsigned().notNullable().references('users.id').onDelete('CASCADE');
    table.string('token_hash', 64).notNullable().unique();
    table.integer('issued_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('expires_at').notNullable();
    table.dateTime('used_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('password_resets');
}
