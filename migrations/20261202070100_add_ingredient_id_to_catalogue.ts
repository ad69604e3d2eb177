import type { Knex } from 'knex';

const TABLES = [
  ['fermentables', 'fermentables'],
  ['hops', 'hops'],
  ['yeasts', 'yeasts'],
  ['other_additions', 'others'],
] as const;

// Each catalogue entry gets its ingredient identity; existing entries are given one each.
export async function up(knex: Knex): Promise<void> {
  for (const [table, kind] of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.integer('ingredient_id').unsigned().nullable();
    });
    const rows: { id: number }[] = await knex(table).select('id').orderBy('id');
    for (const row of rows) {
      const [ingredientId] = await knex('ingredients').insert({ kind });
      await knex(table).where({ id: row.id }).update({ ingredient_id: ingredientId });
    }
    await knex.schema.alterTable(table, (t) => {
      t.integer('ingredient_id').unsigned().notNullable().alter();
      t.unique(['ingredient_id']);
      t.foreign('ingredient_id').references('ingredients.id');
    });
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const [table] of TABLES) {
    await knex.schema.alterTable(table, (t) => {
      t.dropForeign(['ingredient_id']);
      t.dropUnique(['ingredient_id']);
      t.dropColumn('ingredient_id');
    });
  }
  await knex('ingredients').del();
}
