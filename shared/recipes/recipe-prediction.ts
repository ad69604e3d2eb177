import {
  abvLinearEstimate,
  bitternessRatio,
  brewhouseVolumes,
  finalGravityFromAttenuation,
  hopStandIbu,
  mashEfficiencyFromBrewhouse,
  moreyColourMetric,
  originalGravityMetric,
  ScienceRangeError,
  strengthBreakdown,
  strikeWaterTemperature,
  tinsethIbu,
} from '@shared/science';
import { BrewhouseSettings } from './brewhouse-settings';
import { HOP_STAND_TEMPERATURE_C, hopTimeProblem } from './hop-timing';
import { Fermentable, FermentableKind, IngredientCatalogue } from './ingredient';
import { HopItem, RecipeDesign } from './recipe-design';
import { FermentableShare, HopBitterness, RecipePrediction, RecipeWaterPlan } from './recipe-prediction-model';
import { compareFiguresToStyle, StyleTargetComparison } from './style-comparison';
import { StyleTarget } from './style-target';

/** Kinds whose extract comes from the mash, so the brewhouse efficiency applies to them. */
export const MASHED_KINDS: readonly FermentableKind[] = ['grain', 'adjunct'];

/** Runs one figure's calculation; a refused input becomes a problem in words instead of a figure. */
function attempt<T>(problems: string[], what: string, calculate: () => T): T | null {
  try {
    return calculate();
  } catch (error) {
    if (error instanceof ScienceRangeError) {
      problems.push(`${what}: ${error.message}`);
      return null;
    }
    throw error;
  }
}

interface BillItem {
  index: number;
  entry: Fermentable;
  amountKg: number;
}

function billOf(design: RecipeDesign, catalogue: IngredientCatalogue, problems: string[]): BillItem[] {
  return design.fermentables.flatMap((item, index) => {
    const entry = catalogue.fermentables.find((each) => each.id === item.fermentableId);
    if (!entry) problems.push(`Fermentable ${index + 1} is not in the catalogue.`);
    return entry ? [{ index, entry, amountKg: item.amountKg }] : [];
  });
}

// The design's efficiency is the brewhouse efficiency into the fermenter: the share of the mashed kinds'
// extract that reaches the batch volume. Other kinds dissolve whole.
function originalGravity(bill: BillItem[], design: RecipeDesign): number {
  const fermentables = bill.map(({ entry, amountKg }) => ({
    kilograms: amountKg,
    extractYieldPercent: MASHED_KINDS.includes(entry.kind) ? (entry.extractPercent * design.mashEfficiencyPercent) / 100 : entry.extractPercent,
  }));
  return originalGravityMetric(fermentables, 100, design.batchVolumeLitres);
}

/** IBU of one addition: Tinseth in the boil (first wort for the whole boil), a hop stand below it, none from dry hops. */
function additionIbu(hop: HopItem, alphaPercent: number, og: number, design: RecipeDesign): number {
  const addition = (minutes: number) => ({ grams: hop.amountGrams, alphaPercent, minutes });
  switch (hop.use) {
    case 'first wort':
      return tinsethIbu(addition(design.boilMinutes), og, design.batchVolumeLitres);
    case 'boil':
      return tinsethIbu(addition(hop.time), og, design.batchVolumeLitres);
    case 'whirlpool':
      return hopStandIbu(addition(hop.time), og, design.batchVolumeLitres, HOP_STAND_TEMPERATURE_C);
    default:
      return 0;
  }
}

function bitterness(design: RecipeDesign, catalogue: IngredientCatalogue, og: number, problems: string[]): HopBitterness[] {
  return design.hops.flatMap((item, index) => {
    const entry = catalogue.hops.find((each) => each.id === item.hopId);
    if (!entry) {
      problems.push(`Hop addition ${index + 1} is not in the catalogue.`);
      return [];
    }
    const timeProblem = hopTimeProblem(item, design.boilMinutes);
    if (timeProblem) {
      problems.push(`Hop addition ${index + 1}: time ${timeProblem}.`);
      return [];
    }
    const ibu = attempt(problems, `IBU of ${entry.name}`, () => additionIbu(item, entry.alphaAcidPercent, og, design));
    return ibu === null ? [] : [{ index, hopId: entry.id, name: entry.name, use: item.use, time: item.time, amountGrams: item.amountGrams, ibu }];
  });
}

function waterPlanOf(design: RecipeDesign, bill: BillItem[], brewhouse: BrewhouseSettings, og: number): RecipeWaterPlan | null {
  const grainKilograms = bill.filter(({ entry }) => MASHED_KINDS.includes(entry.kind)).reduce((sum, item) => sum + item.amountKg, 0);
  if (grainKilograms === 0 || design.mashSteps.length === 0) return null;
  const plan = brewhouseVolumes(
    {
      batchLitres: design.batchVolumeLitres,
      grainKilograms,
      boilMinutes: design.boilMinutes,
      boilOffLitresPerHour: brewhouse.boilOffLitresPerHour,
      grainAbsorptionLitresPerKg: brewhouse.grainAbsorptionLitresPerKg,
      kettleLossLitres: brewhouse.kettleLossLitres,
      // The batch volume is what goes into the fermenter; the fermenter's own loss comes off it later.
      fermenterLossLitres: 0,
      mashRatioLitresPerKg: brewhouse.mashThicknessLitresPerKg,
    },
    og,
  );
  const tun = brewhouse.mashTunHeatCapacityKjPerK ? { heatCapacityKjPerK: brewhouse.mashTunHeatCapacityKjPerK, grainKilograms } : undefined;
  const strikeTemperatureC = strikeWaterTemperature(design.mashSteps[0].temperatureC, brewhouse.grainTemperatureC, brewhouse.mashThicknessLitresPerKg, undefined, tun);
  return {
    strikeLitres: plan.strikeLitres,
    spargeLitres: plan.spargeLitres,
    strikeTemperatureC,
    preBoilLitres: plan.preBoilLitres,
    preBoilGravity: plan.preBoilGravity ?? og,
    mashEfficiencyPercent: mashEfficiencyFromBrewhouse(design.mashEfficiencyPercent, design.batchVolumeLitres, brewhouse.kettleLossLitres),
    kettleCapacityLitres: brewhouse.kettleCapacityLitres,
    exceedsKettle: brewhouse.kettleCapacityLitres !== null && plan.preBoilLitres > brewhouse.kettleCapacityLitres,
  };
}

function sharesOf(bill: BillItem[]): FermentableShare[] {
  const total = bill.reduce((sum, item) => sum + item.amountKg, 0);
  return bill.map(({ index, entry, amountKg }) => {
    const sharePercent = total > 0 ? (100 * amountKg) / total : 0;
    return {
      index,
      fermentableId: entry.id,
      name: entry.name,
      amountKg,
      sharePercent,
      maxSharePercent: entry.maxSharePercent,
      aboveUsualMax: entry.maxSharePercent !== null && sharePercent > entry.maxSharePercent,
    };
  });
}

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
