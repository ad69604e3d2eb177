import type { Knex } from 'knex';

// One row per scheduled job: the process holding it and until when, so two servers never run it at once.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('job_leases', (table) => {
    table.string('name', 60).primary();
    table.string('holder', 80).nullable();
    table.dateTime('lease_until', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.dateTime('last_run_at', { precision: 3 }).nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('job_leases');
}
