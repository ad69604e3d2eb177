import type { Knex } from 'knex';

// The logger push caps now count in request_counters, like every other limit.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.dropTable('push_rate_windows');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.createTable('push_rate_windows', (table) => {
    table.string('rate_key', 120).notNullable();
    table.bigInteger('window_start').unsigned().notNullable();
    table.integer('hits').unsigned().notNullable().defaultTo(0);
    table.primary(['rate_key', 'window_start']);
    table.index(['window_start']);
  });
}
