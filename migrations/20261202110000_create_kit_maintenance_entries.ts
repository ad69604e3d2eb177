import type { Knex } from 'knex';

// The maintenance log of the kit register: what was done to an item, when, by whom, and when it is due again.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('kit_maintenance_entries', (table) => {
    table.increments('id').primary();
    table.integer('kit_item_id').unsigned().notNullable().references('id').inTable('kit_items');
    table.date('performed_on').notNullable();
    table.string('work', 1000).notNullable();
    table.string('performed_by', 100).notNullable();
    table.date('next_due_on').nullable();
    table.integer('recorded_by_user_id').unsigned().notNullable().references('id').inTable('users');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['kit_item_id', 'performed_on']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('kit_maintenance_entries');
}
