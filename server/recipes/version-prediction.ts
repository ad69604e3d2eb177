import { BatchPrediction } from '@shared/batches';
import { predictRecipe, RecipeVersion } from '@shared/recipes';

/**
 * What a saved version predicts, in the figures a batch keeps: OG, FG, ABV, pre-boil volume and
 * gravity, batch volume and the yeast's expected attenuation. Read from the version's own snapshot
 * (ingredient values and brewhouse as saved), so no later catalogue edit changes a batch's plan.
 */
export function predictVersion(version: Pick<RecipeVersion, 'design' | 'ingredients' | 'brewhouse'>): BatchPrediction {
  const { design, ingredients, brewhouse } = version;
  const prediction = predictRecipe(design, ingredients, brewhouse);
  const yeast = ingredients.yeasts.find((y) => y.id === design.yeastId);
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
