import { brewhouseVolumes, mashEfficiencyFromBrewhouse, strikeWaterTemperature } from '@shared/science';
import { BrewhouseSettings } from './brewhouse-settings';
import { BillItem, mashedKilograms } from './recipe-bill';
import { RecipeDesign } from './recipe-design';
import { RecipeWaterPlan } from './recipe-prediction-model';

/** Strike and sparge water, strike temperature and the pre-boil volume and gravity; none without a mash. */
export function waterPlanOf(design: RecipeDesign, bill: BillItem[], brewhouse: BrewhouseSettings, og: number): RecipeWaterPlan | null {
  const grainKilograms = mashedKilograms(bill);
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
