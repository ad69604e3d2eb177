import { abvLinearEstimate, bitternessRatio, finalGravityFromAttenuation, moreyColourMetric, strengthBreakdown } from '@shared/science';
import { BrewhouseSettings } from './brewhouse-settings';
import { attempt } from './figure-attempt';
import { IngredientCatalogue } from './ingredient';
import { billOf, originalGravity, sharesOf } from './recipe-bill';
import { bitterness } from './recipe-bitterness';
import { RecipeDesign } from './recipe-design';
import { RecipePrediction } from './recipe-prediction-model';
import { waterPlanOf } from './recipe-water-plan';
import { compareFiguresToStyle, StyleTargetComparison } from './style-comparison';
import { StyleTarget } from './style-target';

/** OG, FG, both ABV figures, IBU, colour, BU:GU, bill shares and the water plan of a design, all from @shared/science. */
export function predictRecipe(design: RecipeDesign, catalogue: IngredientCatalogue, brewhouse: BrewhouseSettings): RecipePrediction {
  const problems: string[] = [];
  const bill = billOf(design, catalogue, problems);
  const yeast = catalogue.yeasts.find((each) => each.id === design.yeastId) ?? null;
  const og = bill.length > 0 ? attempt(problems, 'OG', () => originalGravity(bill, design)) : null;
  const attenuation = yeast && (yeast.attenuationMinPercent + yeast.attenuationMaxPercent) / 2;
  const fg = og !== null && attenuation !== null ? attempt(problems, 'FG', () => finalGravityFromAttenuation(og, attenuation)) : null;
  const strength = og !== null && fg !== null && og > fg ? attempt(problems, 'ABV', () => strengthBreakdown(og, fg)) : null;
  const abvEstimate = og !== null && fg !== null ? attempt(problems, 'ABV estimate', () => abvLinearEstimate(og, fg)) : null;
  const hopBitterness = og !== null ? bitterness(design, catalogue, og, problems) : [];
  const ibu = og !== null ? hopBitterness.reduce((sum, hop) => sum + hop.ibu, 0) : null;
  const colour = bill.length > 0
    ? attempt(problems, 'Colour', () => moreyColourMetric(bill.map(({ entry, amountKg }) => ({ kilograms: amountKg, lovibond: entry.colourLovibond })), design.batchVolumeLitres))
    : null;
  return {
    og,
    fg,
    abvEstimate,
    abvDensityBased: strength?.percentVolume20 ?? null,
    strength,
    ibu,
    hopBitterness,
    colourSrm: colour?.srm ?? null,
    colourEbc: colour?.ebc ?? null,
    buGu: og !== null && ibu !== null && og >= 1.001 ? attempt(problems, 'BU:GU', () => bitternessRatio(ibu, og)) : null,
    shares: sharesOf(bill),
    waterPlan: og !== null ? attempt(problems, 'Water plan', () => waterPlanOf(design, bill, brewhouse, og)) : null,
    problems,
  };
}

/** Each predicted figure against the style's range; ABV is compared by its density-based figure. */
export function compareToStyle(prediction: RecipePrediction, style: StyleTarget): StyleTargetComparison[] {
  return compareFiguresToStyle(
    { og: prediction.og, fg: prediction.fg, abv: prediction.abvDensityBased, ibu: prediction.ibu, colourSrm: prediction.colourSrm },
    style,
  );
}
