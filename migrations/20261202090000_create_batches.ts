import type { Knex } from 'knex';

// A brew from planning to packaging. The fermenter is a kit register row, and each status date is
// its own column so bookings and the brew plan can ask which batch holds which fermenter when.
// The recipe's predictions are copied in when the batch starts: later edits of the recipe, the
// catalogue or the brewhouse settings never change what this batch was brewed against.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('batches', (table) => {
    table.increments('id').primary();
    table.string('name', 100).notNullable();
    table.integer('brewer_user_id').unsigned().notNullable().references('users.id');
    table.integer('created_by_user_id').unsigned().notNullable().references('users.id');
    table.integer('recipe_id').unsigned().nullable().references('recipes.id');
    table.integer('recipe_version').unsigned().nullable();
    table.json('predicted').nullable();
    table.date('brew_date').notNullable();
    table.decimal('planned_volume_litres', 7, 2).notNullable();
    table.integer('fermenter_kit_item_id').unsigned().nullable().references('kit_items.id');
    table.enu('status', ['planned', 'brewing', 'fermenting', 'conditioning', 'packaged', 'archived']).notNullable().defaultTo('planned');
    table.dateTime('planned_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('brewing_at').nullable();
    table.dateTime('fermenting_at').nullable();
    table.dateTime('conditioning_at').nullable();
    table.dateTime('packaged_at').nullable();
    table.dateTime('archived_at').nullable();
    table.decimal('wort_correction_factor', 5, 3).notNullable().defaultTo(1.04);
    table.string('notes', 4000).notNullable().defaultTo('');
    table.dateTime('created_at').notNullable().defaultTo(knex.fn.now());
    table.dateTime('updated_at').notNullable().defaultTo(knex.fn.now());
    table.index(['brewer_user_id', 'status']);
    table.index(['fermenter_kit_item_id', 'status']);
    table.index(['status']);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('batches');
}
