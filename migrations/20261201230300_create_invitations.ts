import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('invitations', (table) => {
    table.increments('id').primary();
    table.string('email', 254).notNullable().index();
    table.json('roles').notNullable();
    table.string('token_hash', 64).notNullable().unique();
    table.integer('invited_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('expires_at').notNullable();
    table.dateTime('accepted_at').nullable();
    table.dateTime('revoked_at').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('invitations');
}
