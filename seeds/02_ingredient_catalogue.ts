import type { Knex } from 'knex';
import { CATALOGUE_KINDS } from '../server/catalogue/catalogue-kinds';
import { catalogueRepository } from '../server/catalogue/catalogue.repository';

// A starter catalogue with generic descriptive names. Extract yields, colours, alpha acids and
// attenuation ranges are typical figures of the trade (common practice), rounded; a co-op edits them
// to match what it buys. Entries that already exist (by name) are left as they are.
export const FERMENTABLES = [
  ['Pale malt, 2-row', 'grain', 80, 2, 100],
  ['Pilsner malt', 'grain', 81, 1.6, 100],
  ['Pale ale malt', 'grain', 80, 3, 100],
  ['Munich malt', 'grain', 78, 9, 80],
  ['Vienna malt', 'grain', 78, 4, 90],
  ['Wheat malt', 'grain', 80, 2, 60],
  ['Crystal malt 40 °L', 'grain', 74, 40, 20],
  ['Crystal malt 60 °L', 'grain', 74, 60, 20],
  ['Crystal malt 120 °L', 'grain', 72, 120, 10],
  ['Chocolate malt', 'grain', 70, 350, 10],
  ['Roasted barley', 'grain', 68, 450, 10],
  ['Flaked oats', 'adjunct', 70, 1, 30],
  ['Flaked maize', 'adjunct', 80, 1, 30],
  ['Light dry malt extract', 'extract', 95, 4, 100],
  ['White sugar (sucrose)', 'sugar', 100, 0, 20],
  ['Dark candy syrup', 'sugar', 78, 80, 15],
] as const;

export const HOPS = [
  ['High-alpha bittering hop', 13, 'pellet'],
  ['English aroma hop', 5, 'pellet'],
  ['Citrus aroma hop', 10, 'pellet'],
  ['Continental aroma hop', 4, 'pellet'],
  ['Floral aroma hop, whole cone', 4.5, 'whole'],
] as const;

export const YEASTS = [
  ['Clean ale yeast', 73, 80, 15, 22, 'medium'],
  ['English ale yeast', 65, 72, 17, 21, 'high'],
  ['Lager yeast', 73, 77, 9, 13, 'medium'],
  ['Belgian-style ale yeast', 75, 85, 18, 26, 'medium'],
  ['High-gravity ale yeast', 75, 85, 16, 22, 'medium'],
  ['Wheat beer yeast', 72, 76, 18, 24, 'low'],
] as const;

const OTHERS = [
  ['Irish moss', 'fining'],
  ['Calcium sulfate (gypsum)', 'water agent'],
  ['Calcium chloride', 'water agent'],
  ['Coriander seed', 'spice'],
  ['Dried orange peel', 'flavouring'],
  ['Yeast nutrient', 'other'],
] as const;

/** Adds each entry, with its ingredient identity, unless an entry of that name exists. */
async function addMissing(knex: Knex, kind: keyof typeof CATALOGUE_KINDS, entries: Record<string, unknown>[]): Promise<void> {
  const spec = CATALOGUE_KINDS[kind];
  await knex.transaction(async (trx) => {
    const taken = await catalogueRepository.idsByEqualName(trx, spec, entries.map((entry) => String(entry.name)));
    for (const [index, entry] of entries.entries()) if (!taken.has(index)) await catalogueRepository.insert(trx, spec, entry);
  });
}

export async function seed(knex: Knex): Promise<void> {
  await addMissing(knex, 'fermentables', FERMENTABLES.map(([name, kind, extractPercent, colourLovibond, maxSharePercent]) => ({ name, kind, extractPercent, colourLovibond, maxSharePercent })));
  await addMissing(knex, 'hops', HOPS.map(([name, alphaAcidPercent, form]) => ({ name, alphaAcidPercent, form })));
  await addMissing(
    knex,
    'yeasts',
    YEASTS.map(([name, attenuationMinPercent, attenuationMaxPercent, temperatureMinC, temperatureMaxC, flocculation]) => ({
      name,
      attenuationMinPercent,
      attenuationMaxPercent,
      temperatureMinC,
      temperatureMaxC,
      flocculation,
    })),
  );
  await addMissing(knex, 'others', OTHERS.map(([name, kind]) => ({ name, kind })));
}
