import type { Knex } from 'knex';

// The co-op's equipment register: fermenters, kettles, chillers, kegging gear. Batches hold a
// fermenter from it and bookings reserve any item of it; there is one such table.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('kit_items', (table) => {
    table.increments('id').primary();
    table.string('code', 20).notNullable().unique();
    table.string('name', 100).notNullable();
    table.enu('kind', ['fermenter', 'kettle', 'chiller', 'kegging', 'other']).notNullable();
    table.decimal('capacity_litres', 8, 2).nullable();
    table.enu('state', ['in_service', 'maintenance', 'retired']).notNullable().defaultTo('in_service');
    table.integer('turnaround_hours').unsigned().notNullable().defaultTo(0);
    table.string('notes', 2000).notNullable().defaultTo('');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('kit_items');
}
