import type { Knex } from 'knex';

// A brewer's sign-off of a batch's declared strength. The record is the whole working as it stood
// (a snapshot no later edit rewrites); the fingerprint of the readings it used tells when it went stale.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('strength_sign_offs', (table) => {
    table.increments('id').primary();
    table.integer('batch_id').unsigned().notNullable().references('batches.id').onDelete('CASCADE');
    table.decimal('declared_percent_volume', 5, 2).notNullable();
    table.integer('tolerance_class_id').unsigned().notNullable().references('tolerance_classes.id');
    table.enu('verdict', ['within', 'outside', 'undecided']).notNullable();
    table.json('record').notNullable();
    table.string('readings_fingerprint', 64).notNullable();
    table.integer('signed_by_user_id').unsigned().notNullable().references('users.id');
    table.dateTime('signed_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.index(['batch_id', 'id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('strength_sign_offs');
}
