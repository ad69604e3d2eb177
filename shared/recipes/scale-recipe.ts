import { BrewhouseSettings } from './brewhouse-settings';
import { IngredientCatalogue } from './ingredient';
import { RecipeDesign } from './recipe-design';
import { MASHED_KINDS } from './recipe-bill';
import { predictRecipe } from './recipe-prediction';

/** Where a design is scaled to. */
export interface ScaleTarget {
  batchVolumeLitres: number;
  mashEfficiencyPercent: number;
}

const MAX_CORRECTIONS = 8;
const TOLERANCE = 1e-9;

/**
 * The design at another volume and efficiency with the same OG and IBU. Amounts are first scaled by
 * volume (and mashed fermentables by the efficiency ratio too), then corrected with the prediction
 * library itself until OG and IBU match, so the result holds whatever the gravity and bitterness models.
 */
export function scaleRecipe(design: RecipeDesign, target: ScaleTarget, catalogue: IngredientCatalogue, brewhouse: BrewhouseSettings): RecipeDesign {
  const before = predictRecipe(design, catalogue, brewhouse);
  const volumeRatio = target.batchVolumeLitres / design.batchVolumeLitres;
  const efficiencyRatio = design.mashEfficiencyPercent / target.mashEfficiencyPercent;
  const mashed = (fermentableId: number) =>
    MASHED_KINDS.includes(catalogue.fermentables.find((entry) => entry.id === fermentableId)?.kind ?? 'grain');
  let scaled: RecipeDesign = {
    ...design,
    ...target,
    fermentables: design.fermentables.map((item) => ({
      ...item,
      amountKg: item.amountKg * volumeRatio * (mashed(item.fermentableId) ? efficiencyRatio : 1),
    })),
    hops: design.hops.map((item) => ({ ...item, amountGrams: item.amountGrams * volumeRatio })),
    others: design.others.map((item) => ({ ...item, amount: item.amount * volumeRatio })),
  };
  for (let step = 0; step < MAX_CORRECTIONS; step++) {
    const now = predictRecipe(scaled, catalogue, brewhouse);
    const gravityFactor = before.og !== null && now.og !== null && now.og > 1 ? (before.og - 1) / (now.og - 1) : 1;
    const bitternessFactor = before.ibu && now.ibu ? before.ibu / now.ibu : 1;
    if (Math.abs(gravityFactor - 1) < TOLERANCE && Math.abs(bitternessFactor - 1) < TOLERANCE) break;
    scaled = {
      ...scaled,
      fermentables: scaled.fermentables.map((item) => ({ ...item, amountKg: item.amountKg * gravityFactor })),
      hops: scaled.hops.map((item) => ({ ...item, amountGrams: item.amountGrams * (bitternessFactor || 1) })),
    };
  }
  return scaled;
}
