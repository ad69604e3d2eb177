import type { Knex } from 'knex';

// What was measured on the brew day, one row per batch; every figure may still be missing.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('brew_day_measurements', (table) => {
    table.integer('batch_id').unsigned().primary().references('batches.id').onDelete('CASCADE');
    table.decimal('pre_boil_litres', 7, 2).nullable();
    table.decimal('pre_boil_gravity', 6, 4).nullable();
    table.decimal('fermenter_litres', 7, 2).nullable();
    table.decimal('original_gravity', 6, 4).nullable();
    table.decimal('original_gravity_temperature_c', 5, 2).nullable();
    table.dateTime('pitched_at').nullable();
    table.integer('updated_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('brew_day_measurements');
}
