import type { Knex } from 'knex';

// One row per member who has ever paid: the plan, the last day covered, and the saved card for renewal.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('dues_memberships', (table) => {
    table.integer('user_id').unsigned().primary().references('users.id').onDelete('CASCADE');
    table.integer('plan_id').unsigned().nullable().references('dues_plans.id');
    table.date('paid_through').nullable();
    table.string('stripe_customer_id', 100).nullable();
    table.string('saved_card', 60).nullable();
    table.boolean('renew_by_card').notNullable().defaultTo(false);
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.index(['paid_through']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('dues_memberships');
}
