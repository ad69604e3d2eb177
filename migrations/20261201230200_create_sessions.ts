import type { Knex } from 'knex';

// Shape expected by connect-session-knex (sid, sess, expired), so the store never creates it itself.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('sessions', (table) => {
    table.string('sid', 255).primary();
    table.json('sess').notNullable();
    table.dateTime('expired').notNullable().index();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('sessions');
}
