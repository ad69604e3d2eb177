import { requireInRange } from '../units/range-guard';
import type { Kilograms, Litres, SpecificGravity } from '../units/unit-types';

/** The brewhouse settings and batch a volume plan is made from (litres, kilograms, minutes). */
export interface VolumePlanSettings {
  batchLitres: Litres;
  grainKilograms: Kilograms;
  boilMinutes: number;
  boilOffLitresPerHour: Litres;
  /** Water kept by spent grain, L/kg; common practice about 0.8–1.0. */
  grainAbsorptionLitresPerKg?: number;
  kettleLossLitres?: Litres;
  fermenterLossLitres?: Litres;
  /** Strike water per kilogram of grain, L/kg. */
  mashRatioLitresPerKg?: number;
  /** Wort shrinks as it cools from boiling; common practice about 4 %. */
  coolingShrinkagePercent?: number;
}

/** The volumes of a brew day, and the pre-boil gravity when the OG is known. */
export interface VolumePlan {
  intoFermenterLitres: Litres;
  postBoilLitres: Litres;
  preBoilLitres: Litres;
  totalWaterLitres: Litres;
  strikeLitres: Litres;
  spargeLitres: Litres;
  /** The strike alone exceeds the water needed: no sparge, and the mash ratio should come down. */
  strikeExceedsTotal: boolean;
  preBoilGravity?: SpecificGravity;
}

/** Strike, sparge, pre-boil and total water from brewhouse settings (batch-sparge style bookkeeping). */
export function brewhouseVolumes(settings: VolumePlanSettings, og?: SpecificGravity): VolumePlan {
  const s = { grainAbsorptionLitresPerKg: 1, kettleLossLitres: 0, fermenterLossLitres: 0, mashRatioLitresPerKg: 3, coolingShrinkagePercent: 4, ...settings };
  requireInRange('batchLitres', s.batchLitres, 0.1, 1e5, 'L');
  requireInRange('grainKilograms', s.grainKilograms, 0, 1e5, 'kg');
  requireInRange('boilMinutes', s.boilMinutes, 0, 600, 'min');
  requireInRange('boilOffLitresPerHour', s.boilOffLitresPerHour, 0, 1e4, 'L/h');
  requireInRange('grainAbsorptionLitresPerKg', s.grainAbsorptionLitresPerKg, 0, 5, 'L/kg');
  requireInRange('kettleLossLitres', s.kettleLossLitres, 0, 1e5, 'L');
  requireInRange('fermenterLossLitres', s.fermenterLossLitres, 0, 1e5, 'L');
  requireInRange('mashRatioLitresPerKg', s.mashRatioLitresPerKg, 1, 10, 'L/kg');
  requireInRange('coolingShrinkagePercent', s.coolingShrinkagePercent, 0, 10, '%');
  const intoFermenterLitres = s.batchLitres + s.fermenterLossLitres;
  const postBoilLitres = (intoFermenterLitres + s.kettleLossLitres) / (1 - s.coolingShrinkagePercent / 100);
  const preBoilLitres = postBoilLitres + (s.boilOffLitresPerHour * s.boilMinutes) / 60;
  const totalWaterLitres = preBoilLitres + s.grainKilograms * s.grainAbsorptionLitresPerKg;
  const wantedStrike = s.grainKilograms * s.mashRatioLitresPerKg;
  const strikeLitres = Math.min(wantedStrike, totalWaterLitres);
  const plan: VolumePlan = {
    intoFermenterLitres, postBoilLitres, preBoilLitres, totalWaterLitres, strikeLitres,
    spargeLitres: totalWaterLitres - strikeLitres, strikeExceedsTotal: wantedStrike > totalWaterLitres,
  };
  if (og !== undefined) {
    requireInRange('og', og, 1, 1.2, 'SG');
    // Extract is conserved through the boil: points × volume is the same before and after.
    plan.preBoilGravity = 1 + ((og - 1) * postBoilLitres) / preBoilLitres;
  }
  return plan;
}
