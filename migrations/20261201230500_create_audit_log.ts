import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('audit_log', (table) => {
    table.bigIncrements('id').primary();
    table.integer('actor_user_id').unsigned().nullable().references('users.id');
    table.string('action', 60).notNullable();
    table.string('subject_type', 40).notNullable();
    table.integer('subject_id').unsigned().nullable();
    table.json('detail').nullable();
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['subject_type', 'subject_id']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('audit_log');
}
