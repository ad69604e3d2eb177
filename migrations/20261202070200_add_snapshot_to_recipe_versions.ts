import type { Knex } from 'knex';

// Versions become snapshots: each carries the ingredient properties and brewhouse settings it was
// made with, and the format of its design. Existing versions are filled from the catalogue and the
// brewhouse as they are now (the best record there is), and their other-addition units move from
// free text (format 1) to the fixed list g, kg, mL, L, each (format 2).
// This file keeps its own copies of the mappings so later code changes never alter it.

type Row = Record<string, unknown>;
type OtherItem = { otherId: number; amount: number; unit: string; when: string };
type Design = { fermentables: { fermentableId: number }[]; hops: { hopId: number }[]; yeastId: number | null; others: OtherItem[] } & Row;

const DEFAULT_BREWHOUSE = {
  boilOffLitresPerHour: 4,
  grainAbsorptionLitresPerKg: 1,
  kettleLossLitres: 1.5,
  fermenterLossLitres: 1,
  mashThicknessLitresPerKg: 3,
  grainTemperatureC: 18,
  mashTunHeatCapacityKjPerK: null,
};

const ENTRY_COLUMNS: Record<string, [string, Record<string, string>]> = {
  fermentables: ['fermentables', { name: 'name', kind: 'kind', extractPercent: 'extract_percent', colourLovibond: 'colour_lovibond', maxSharePercent: 'max_share_percent' }],
  hops: ['hops', { name: 'name', alphaAcidPercent: 'alpha_acid_percent', form: 'form' }],
  yeasts: [
    'yeasts',
    {
      name: 'name',
      attenuationMinPercent: 'attenuation_min_percent',
      attenuationMaxPercent: 'attenuation_max_percent',
      temperatureMinC: 'temperature_min_c',
      temperatureMaxC: 'temperature_max_c',
      flocculation: 'flocculation',
    },
  ],
  others: ['other_additions', { name: 'name', kind: 'kind' }],
};

// Free-text units of format 1 and their place in the fixed list; factors: tsp 5 mL and tbsp 15 mL
// (metric spoons, common practice), oz 28.349523125 g and lb 0.45359237 kg (exact by definition).
const UNIT_MAP: Record<string, [string, number]> = {
  g: ['g', 1], gram: ['g', 1], grams: ['g', 1], gr: ['g', 1],
  kg: ['kg', 1], kilogram: ['kg', 1], kilograms: ['kg', 1],
  ml: ['mL', 1], millilitre: ['mL', 1], millilitres: ['mL', 1], milliliter: ['mL', 1], milliliters: ['mL', 1],
  l: ['L', 1], litre: ['L', 1], litres: ['L', 1], liter: ['L', 1], liters: ['L', 1],
  tsp: ['mL', 5], tbsp: ['mL', 15], oz: ['g', 28.349523125], lb: ['kg', 0.45359237],
  each: ['each', 1], pc: ['each', 1], pcs: ['each', 1], piece: ['each', 1], pieces: ['each', 1],
};

function migrateOther(item: OtherItem): OtherItem {
  const known = UNIT_MAP[item.unit.trim().toLowerCase()];
  if (known) return { ...item, unit: known[0], amount: item.amount * known[1] };
  // A unit outside the list (tablet, stick, pod…) counts pieces; the old word stays in "when".
  const when = [item.when.trim(), `(${item.unit.trim()})`].filter(Boolean).join(' ').slice(0, 60);
  return { ...item, unit: 'each', when };
}

const parse = (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value);

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('recipe_versions', (t) => {
    t.integer('design_format').unsigned().notNullable().defaultTo(1);
    t.json('ingredients').nullable();
    t.json('brewhouse').nullable();
  });
  const catalogue: Record<string, Row[]> = {};
  for (const [kind, [table, columns]] of Object.entries(ENTRY_COLUMNS)) {
    catalogue[kind] = (await knex(table).select()).map((row: Row) => ({
      id: row.id,
      ingredientId: row.ingredient_id,
      ...Object.fromEntries(Object.entries(columns).map(([field, column]) => [field, row[column]])),
      retired: row.retired_at !== null,
    }));
  }
  const settings = await knex('brewhouse_settings').where({ id: 1 }).first();
  const brewhouse = { ...DEFAULT_BREWHOUSE, ...(settings ? parse(settings.settings) : {}) };
  const versions: { id: number; design: unknown }[] = await knex('recipe_versions').select('id', 'design');
  for (const version of versions) {
    const design = parse(version.design) as Design;
    const migrated = { ...design, others: design.others.map(migrateOther) };
    const used = (kind: string, ids: number[]) => catalogue[kind].filter((entry) => ids.includes(entry.id as number));
    const ingredients = {
      fermentables: used('fermentables', design.fermentables.map((item) => item.fermentableId)),
      hops: used('hops', design.hops.map((item) => item.hopId)),
      yeasts: used('yeasts', design.yeastId === null ? [] : [design.yeastId]),
      others: used('others', design.others.map((item) => item.otherId)),
    };
    await knex('recipe_versions')
      .where({ id: version.id })
      .update({ design: JSON.stringify(migrated), design_format: 2, ingredients: JSON.stringify(ingredients), brewhouse: JSON.stringify(brewhouse) });
  }
  await knex.schema.alterTable('recipe_versions', (t) => {
    t.json('ingredients').notNullable().alter();
    t.json('brewhouse').notNullable().alter();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('recipe_versions', (t) => {
    t.dropColumn('design_format');
    t.dropColumn('ingredients');
    t.dropColumn('brewhouse');
  });
}
