import { randomUUID } from 'node:crypto';
import { Knex } from 'knex';
import { RecipeDesign } from '@shared/recipes';
import { CATALOGUE_KINDS } from '@server/catalogue/catalogue-kinds';
import { catalogueRepository } from '@server/catalogue/catalogue.repository';

/** Catalogue entries with unique names, so each test owns its rows. */
export async function createCatalogueEntries(db: Knex) {
  const tag = randomUUID().slice(0, 8);
  return db.transaction(async (trx) => {
    const add = (kind: keyof typeof CATALOGUE_KINDS, entry: Record<string, unknown>) => catalogueRepository.insert(trx, CATALOGUE_KINDS[kind], entry);
    const fermentableId = await add('fermentables', { name: `Test pale malt ${tag}`, kind: 'grain', extractPercent: 80, colourLovibond: 2, maxSharePercent: 100 });
    const hopId = await add('hops', { name: `Test hop ${tag}`, alphaAcidPercent: 10, form: 'pellet' });
    const yeastId = await add('yeasts', {
      name: `Test yeast ${tag}`,
      attenuationMinPercent: 72,
      attenuationMaxPercent: 78,
      temperatureMinC: 16,
      temperatureMaxC: 22,
      flocculation: 'medium',
    });
    const otherId = await add('others', { name: `Test fining ${tag}`, kind: 'fining' });
    return { tag, fermentableId, hopId, yeastId, otherId };
  });
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
    others: [{ otherId: ids.otherId, amount: 1, unit: 'each', when: 'boil 10 min' }],
    mashSteps: [{ name: 'Rest', temperatureC: 66, minutes: 60 }],
    notes: '',
  };
}
