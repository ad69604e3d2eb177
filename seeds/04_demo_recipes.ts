import type { Knex } from 'knex';
import { RecipeDesign } from '../shared/recipes';
import { snapshotFor } from '../server/recipes/recipe-snapshot';
import { recipesRepository } from '../server/recipes/recipes.repository';

// Demo recipes of the invented co-op, one for each demo batch; amounts are invented for the demo.
export interface DemoRecipe {
  owner: string;
  style: string;
  visibility: 'private' | 'coop';
  design: Omit<RecipeDesign, 'styleId' | 'fermentables' | 'hops' | 'yeastId' | 'others'>;
  fermentables: [string, number][];
  hops: [string, number, number, RecipeDesign['hops'][number]['use']][];
  yeast: string;
}

const mash = (temperatureC: number) => [{ name: 'Saccharification rest', temperatureC, minutes: 60 }];

export const DEMO_RECIPES: DemoRecipe[] = [
  {
    owner: 'priya@fernhollow.example',
    style: 'Pale ale',
    visibility: 'coop',
    design: { name: 'Fernhollow Pale', batchVolumeLitres: 23, mashEfficiencyPercent: 72, boilMinutes: 60, mashSteps: mash(66), notes: 'Demo recipe (invented).' },
    fermentables: [['Pale malt, 2-row', 4.6], ['Munich malt', 0.4], ['Crystal malt 60 °L', 0.3]],
    hops: [['High-alpha bittering hop', 18, 60, 'boil'], ['Citrus aroma hop', 30, 10, 'boil'], ['Citrus aroma hop', 40, 20, 'whirlpool'], ['Citrus aroma hop', 50, 4, 'dry hop']],
    yeast: 'Clean ale yeast',
  },
  {
    owner: 'tomas@fernhollow.example',
    style: 'Strong dark ale',
    visibility: 'coop',
    design: { name: 'Lantern Strong Dark', batchVolumeLitres: 20, mashEfficiencyPercent: 68, boilMinutes: 90, mashSteps: mash(65), notes: 'Demo recipe (invented).' },
    fermentables: [['Pale ale malt', 6.8], ['Munich malt', 1], ['Crystal malt 120 °L', 0.35], ['Chocolate malt', 0.22], ['Roasted barley', 0.08], ['Dark candy syrup', 0.6]],
    hops: [['High-alpha bittering hop', 32, 60, 'boil'], ['English aroma hop', 30, 15, 'boil']],
    yeast: 'High-gravity ale yeast',
  },
  {
    owner: 'jonah@fernhollow.example',
    style: 'Mild',
    visibility: 'private',
    design: { name: 'Hearthside Mild', batchVolumeLitres: 23, mashEfficiencyPercent: 72, boilMinutes: 60, mashSteps: mash(68), notes: 'Demo recipe (invented).' },
    // The brief's mild is about 4 %: near the top of the style's gravity, with a yeast that ferments it dry enough.
    fermentables: [['Pale ale malt', 3.3], ['Crystal malt 60 °L', 0.3], ['Chocolate malt', 0.13], ['Flaked oats', 0.2]],
    hops: [['English aroma hop', 28, 60, 'boil'], ['English aroma hop', 12, 15, 'boil']],
    yeast: 'Clean ale yeast',
  },
];


/** Adds the demo recipes when the co-op has none yet. */
export async function seed(knex: Knex): Promise<void> {
  const existing = await knex('recipes').count<{ count: number }[]>({ count: '*' });
  if (Number(existing[0].count) > 0) return;
  const [users, styles, fermentables, hops, yeasts] = await Promise.all(
    [['users', 'email'], ['style_targets', 'name'], ['fermentables', 'name'], ['hops', 'name'], ['yeasts', 'name']].map(async ([t, key]) =>
      new Map((await knex(t).select('id', `${key} as key`)).map((r: { id: number; key: string }) => [r.key, r.id])),
    ),
  );
  for (const demo of DEMO_RECIPES) {
    const ownerId = users.get(demo.owner);
    if (!ownerId) continue;
    const design: RecipeDesign = {
      ...demo.design,
      styleId: styles.get(demo.style) ?? null,
      fermentables: demo.fermentables.map(([name, amountKg]) => ({ fermentableId: fermentables.get(name)!, amountKg })),
      hops: demo.hops.map(([name, amountGrams, time, use]) => ({ hopId: hops.get(name)!, amountGrams, time, use })),
      yeastId: yeasts.get(demo.yeast) ?? null,
      others: [],
    };
    const stored = await snapshotFor(knex, design, null);
    await knex.transaction((trx) => recipesRepository.insert(trx, { ownerId, visibility: demo.visibility, stored }));
  }
}
