import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { RecipeDesign } from '@shared/recipes';

/** Catalogue entries with unique names, so each test owns its rows. */
export async function createCatalogueEntries(db: Knex) {
  const tag = randomUUID().slice(0, 8);
  const [fermentableId] = await db('fermentables').insert({ name: `Test pale malt ${tag}`, kind: 'grain', extract_percent: 80, colour_lovibond: 2, max_share_percent: 100 });
  const [hopId] = await db('hops').insert({ name: `Test hop ${tag}`, alpha_acid_percent: 10, form: 'pellet' });
  const [yeastId] = await db('yeasts').insert({
    name: `Test yeast ${tag}`,
    attenuation_min_percent: 72,
    attenuation_max_percent: 78,
    temperature_min_c: 16,
    temperature_max_c: 22,
    flocculation: 'medium',
  });
  const [otherId] = await db('other_additions').insert({ name: `Test fining ${tag}`, kind: 'fining' });
  return { tag, fermentableId, hopId, yeastId, otherId };
}

/** A valid design over the given catalogue entries. */
export function sampleDesign(ids: { fermentableId: number; hopId: number; yeastId: number; otherId: number }, name = 'Test pale'): RecipeDesign {
  return {
    name,
    styleId: null,
    batchVolumeLitres: 20,
    mashEfficiencyPercent: 72,
    boilMinutes: 60,
    fermentables: [{ fermentableId: ids.fermentableId, amountKg: 4.5 }],
    hops: [{ hopId: ids.hopId, amountGrams: 25, time: 60, use: 'boil' }],
    yeastId: ids.yeastId,
    others: [{ otherId: ids.otherId, amount: 1, unit: 'tablet', when: 'boil 10 min' }],
    mashSteps: [{ name: 'Rest', temperatureC: 66, minutes: 60 }],
    notes: '',
  };
}
