import type { Knex } from 'knex';

// Every e-mail is written here first, in the transaction of the change it reports, and sent later by
// the dispatcher; a claim (claimed_by, claim_expires_at) keeps two server processes off one message.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('outbox_messages', (table) => {
    table.increments('id').primary();
    table.string('kind', 40).notNullable();
    table.string('recipient', 254).notNullable();
    table.string('subject', 200).notNullable();
    table.text('text_body', 'mediumtext').notNullable();
    table.text('html_body', 'mediumtext').notNullable();
    table.enu('state', ['queued', 'sending', 'sent', 'failed', 'abandoned']).notNullable().defaultTo('queued');
    table.integer('attempts').unsigned().notNullable().defaultTo(0);
    table.dateTime('next_attempt_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.string('claimed_by', 80).nullable();
    table.dateTime('claim_expires_at', { precision: 3 }).nullable();
    table.string('last_error', 500).nullable();
    table.dateTime('sent_at', { precision: 3 }).nullable();
    table.string('dedupe_key', 160).nullable().unique();
    table.dateTime('created_at', { precision: 3 }).notNullable().defaultTo(knex.fn.now(3));
    table.index(['state', 'next_attempt_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('outbox_messages');
}
