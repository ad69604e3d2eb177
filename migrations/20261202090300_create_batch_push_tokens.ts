import type { Knex } from 'knex';

// Tokens a gravity logger sends with its readings; only a hash is kept, the token is shown once.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batch_push_tokens', (table) => {
    table.increments('id').primary();
    table.integer('batch_id').unsigned().notNullable().references('batches.id').onDelete('CASCADE');
    table.string('label', 60).notNullable();
    table.string('token_hash', 64).notNullable().unique();
    table.integer('created_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('last_used_at').nullable();
    table.dateTime('revoked_at').nullable();
    table.index(['batch_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batch_push_tokens');
}
