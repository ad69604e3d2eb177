import type { Knex } from 'knex';

// An index of what each version uses, one row per design line, amounts in SI units (kg, L or a
// count), so "where is this ingredient used" and later stock needs are plain queries. Rows are
// written with their version; existing versions are indexed here from their snapshots.

type Design = {
  fermentables: { fermentableId: number; amountKg: number }[];
  hops: { hopId: number; amountGrams: number; use: string }[];
  yeastId: number | null;
  others: { otherId: number; amount: number; unit: string }[];
};
type Snapshot = Record<'fermentables' | 'hops' | 'yeasts' | 'others', { id: number; ingredientId: number }[]>;

const OTHER_SI: Record<string, [number, 'kg' | 'L' | 'each']> = { g: [0.001, 'kg'], kg: [1, 'kg'], mL: [0.001, 'L'], L: [1, 'L'], each: [1, 'each'] };
const parse = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('recipe_version_items', (table) => {
    table.increments('id').primary();
    table.integer('recipe_version_id').unsigned().notNullable().references('recipe_versions.id').onDelete('CASCADE');
    table.integer('position').unsigned().notNullable();
    table.integer('ingredient_id').unsigned().notNullable().references('ingredients.id');
    table.double('amount').notNullable();
    table.enu('amount_unit', ['kg', 'L', 'each']).notNullable();
    table.string('use', 20).notNullable();
    table.index(['ingredient_id', 'recipe_version_id']);
  });
  const versions: { id: number; design: unknown; ingredients: unknown }[] = await knex('recipe_versions').select('id', 'design', 'ingredients');
  for (const version of versions) {
    const design = parse(version.design) as Design;
    const snapshot = parse(version.ingredients) as Snapshot;
    const identity = (kind: keyof Snapshot, id: number) => snapshot[kind].find((entry) => entry.id === id)?.ingredientId;
    const lines = [
      ...design.fermentables.map((item) => ({ ingredient_id: identity('fermentables', item.fermentableId), amount: item.amountKg, amount_unit: 'kg', use: 'fermentable' })),
      ...design.hops.map((item) => ({ ingredient_id: identity('hops', item.hopId), amount: item.amountGrams / 1000, amount_unit: 'kg', use: item.use })),
      ...(design.yeastId === null ? [] : [{ ingredient_id: identity('yeasts', design.yeastId), amount: 1, amount_unit: 'each', use: 'yeast' }]),
      ...design.others.map((item) => {
        const [factor, unit] = OTHER_SI[item.unit] ?? [1, 'each'];
        return { ingredient_id: identity('others', item.otherId), amount: item.amount * factor, amount_unit: unit, use: 'other' };
      }),
    ];
    const rows = lines.map((line, position) => ({ ...line, position, recipe_version_id: version.id })).filter((row) => row.ingredient_id !== undefined);
    if (rows.length) await knex.insert(rows).into('recipe_version_items' as string);
  }
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('recipe_version_items');
}
