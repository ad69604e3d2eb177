import type { Knex } from 'knex';

// The gravity log. The raw value and unit are kept as read; the corrected SG 20/20 °C sits beside
// them with what the correction used (calibration temperature, wort correction factor, original
// °Bx), so it can be recomputed and checked. One reading per batch, instrument and moment: a file
// imported twice or a logger's retried push never doubles a row.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('gravity_readings', (table) => {
    table.bigIncrements('id').primary();
    table.integer('batch_id').unsigned().notNullable().references('batches.id').onDelete('CASCADE');
    table.dateTime('measured_at').notNullable();
    table.enu('instrument', ['hydrometer', 'refractometer', 'density-meter', 'logger']).notNullable();
    table.decimal('raw_value', 9, 4).notNullable();
    table.enu('raw_unit', ['sg', 'plato', 'brix', 'kg-m3']).notNullable();
    table.decimal('sample_temperature_c', 5, 2).nullable();
    table.decimal('calibration_temperature_c', 5, 2).nullable();
    table.decimal('correction_factor', 5, 3).nullable();
    table.decimal('original_brix', 6, 3).nullable();
    table.decimal('corrected_sg', 7, 5).notNullable();
    table.enu('source', ['hand', 'file', 'push']).notNullable();
    table.integer('upload_id').unsigned().nullable().references('reading_uploads.id').onDelete('SET NULL');
    table.integer('push_token_id').unsigned().nullable().references('batch_push_tokens.id').onDelete('SET NULL');
    table.string('note', 500).notNullable().defaultTo('');
    table.integer('created_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.unique(['batch_id', 'instrument', 'measured_at']);
    table.index(['batch_id', 'measured_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('gravity_readings');
}
