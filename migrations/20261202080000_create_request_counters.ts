import type { Knex } from 'knex';

// Counters of rate limits (sign-in tries, public requests per address), kept in the database so
// that every server process on it counts the same requests.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('request_counters', (table) => {
    table.string('counter_key', 191).primary();
    table.integer('points').unsigned().notNullable();
    table.dateTime('expires_at', { precision: 3 }).notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('request_counters');
}
