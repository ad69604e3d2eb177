import type { Knex } from 'knex';

// Reservations of kit items. Instants are UTC; the zone they were booked in is kept with them, and
// held_until (end plus the item's turnaround at booking time) is what later bookings must not cross.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('bookings', (table) => {
    table.increments('id').primary();
    table.integer('kit_item_id').unsigned().notNullable().references('id').inTable('kit_items');
    table.integer('user_id').unsigned().notNullable().references('id').inTable('users');
    table.integer('created_by_user_id').unsigned().notNullable().references('id').inTable('users');
    table.enu('purpose', ['use', 'maintenance']).notNullable().defaultTo('use');
    table.dateTime('starts_at').notNullable();
    table.dateTime('ends_at').notNullable();
    table.dateTime('held_until').notNullable();
    table.string('time_zone', 64).notNullable();
    table.integer('batch_id').unsigned().nullable();
    table.string('note', 500).notNullable().defaultTo('');
    table.dateTime('cancelled_at').nullable();
    table.integer('cancelled_by_user_id').unsigned().nullable().references('id').inTable('users');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.index(['kit_item_id', 'starts_at']);
    table.index(['user_id', 'ends_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('bookings');
}
