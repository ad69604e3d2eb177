import type { Knex } from 'knex';

// Every successful dues payment, by card or in cash. Plan name and amount are kept as paid, so a later
// change of the plan never rewrites a receipt. The idempotency key makes a retried request one payment.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('dues_payments', (table) => {
    table.increments('id').primary();
    table.integer('user_id').unsigned().notNullable().references('users.id');
    table.integer('plan_id').unsigned().nullable().references('dues_plans.id');
    table.string('plan_name', 60).notNullable();
    table.integer('amount_cents').unsigned().notNullable();
    table.string('currency', 3).notNullable();
    table.enu('method', ['card', 'cash']).notNullable();
    table.enu('kind', ['payment', 'renewal']).notNullable().defaultTo('payment');
    table.enu('status', ['succeeded', 'refunded']).notNullable().defaultTo('succeeded');
    table.string('idempotency_key', 120).notNullable().unique();
    table.string('stripe_charge_id', 100).nullable().unique();
    table.string('stripe_refund_id', 100).nullable();
    table.date('period_start').notNullable();
    table.date('period_end').notNullable();
    table.date('previous_paid_through').nullable();
    table.string('note', 200).notNullable().defaultTo('');
    table.integer('recorded_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('refunded_at').nullable();
    table.integer('refunded_by_user_id').unsigned().nullable().references('users.id');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.index(['user_id', 'created_at']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('dues_payments');
}
