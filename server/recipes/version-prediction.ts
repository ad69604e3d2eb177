import { Knex } from 'knex';
import { BatchPrediction } from '@shared/batches';
import { predictRecipe, RecipeDesign } from '@shared/recipes';
import { brewhouseRepository } from '../brewhouse/brewhouse.repository';
import { createCatalogueService } from '../catalogue/catalogue.service';

/**
 * What a saved version predicts, in the figures a batch keeps: OG, FG, ABV, pre-boil volume and
 * gravity, batch volume and the yeast's expected attenuation. The one place a batch gets its
 * predictions from, so when versions carry their own catalogue snapshot only this function changes.
 */
export async function predictVersion(db: Knex, design: RecipeDesign): Promise<BatchPrediction> {
  const [catalogue, brewhouse] = await Promise.all([createCatalogueService(db).list(true), brewhouseRepository.load(db)]);
  const prediction = predictRecipe(design, catalogue, brewhouse);
  const yeast = catalogue.yeasts.find((y) => y.id === design.yeastId);
  return {
    og: prediction.og,
    fg: prediction.fg,
    abvEstimate: prediction.abvEstimate,
    preBoilLitres: prediction.waterPlan?.preBoilLitres ?? null,
    preBoilGravity: prediction.waterPlan?.preBoilGravity ?? null,
    batchVolumeLitres: design.batchVolumeLitres,
    yeastAttenuationPercent: yeast ? (yeast.attenuationMinPercent + yeast.attenuationMaxPercent) / 2 : null,
  };
}
