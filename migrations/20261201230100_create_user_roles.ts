import type { Knex } from 'knex';

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('user_roles', (table) => {
    table.integer('user_id').unsigned().notNullable().references('users.id').onDelete('CASCADE');
    table.enu('role', ['member', 'brewer', 'admin']).notNullable();
    table.primary(['user_id', 'role']);
    table.index(['role']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('user_roles');
}
