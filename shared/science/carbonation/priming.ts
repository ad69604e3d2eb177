import { requireInRange, requirePositive } from '../units/range-guard';
import { celsiusToFahrenheit } from '../units/unit-conversions';
import type { Celsius, Litres } from '../units/unit-types';
import { gaugePressureForVolumes } from './co2-solubility';

/** Sugars used for priming and the grams of CO2 each gram yields when fully fermented (stoichiometry). */
export const PRIMING_SUGARS = {
  // C12H22O11 + H2O → 4 C2H5OH + 4 CO2: 4 × 44.01 / 342.30
  sucrose: (4 * 44.01) / 342.3,
  // C6H12O6 → 2 C2H5OH + 2 CO2: 2 × 44.01 / 180.16
  'dextrose-anhydrous': (2 * 44.01) / 180.16,
  // C6H12O6·H2O: 2 × 44.01 / 198.17
  'dextrose-monohydrate': (2 * 44.01) / 198.17,
} as const;

/** Name of a priming sugar. */
export type PrimingSugar = keyof typeof PRIMING_SUGARS;

/** Grams of CO2 in one litre of beer per volume of CO2 (density of CO2 at 0 °C, 1 atm). */
const GRAMS_CO2_PER_VOLUME = 1.977;
/** Standard bottles: common practice keeps bottle-conditioned beer at or below about 3 bar gauge when warm. */
export const COMMON_BOTTLE_LIMIT_BAR = 3;

/** CO2 left in beer (volumes) after fermentation, from its highest temperature since; common-practice fit. */
export function residualCo2(highestTemperature: Celsius): number {
  requireInRange('highestTemperature', highestTemperature, 0, 35, '°C');
  const f = celsiusToFahrenheit(highestTemperature);
  return 3.0378 - 0.050062 * f + 0.00026555 * f * f;
}

/** A priming plan and the pressure it implies in a warm bottle, so the app can warn. */
export interface PrimingPlan {
  residualVolumes: number;
  grams: number;
  gramsPerLitre: number;
  impliedGaugeBar: number;
  aboveCommonBottleLimit: boolean;
}

/** Priming sugar for a target CO2 content (volumes), and the gauge pressure at the warm storage temperature. */
export function primingSugar(
  litres: Litres, targetVolumes: number, highestTemperature: Celsius, sugar: PrimingSugar = 'sucrose', storageTemperature: Celsius = 25,
): PrimingPlan {
  requirePositive('litres', litres, 'L');
  requireInRange('targetVolumes', targetVolumes, 0, 6, 'vol');
  if (!Object.prototype.hasOwnProperty.call(PRIMING_SUGARS, sugar)) throw new RangeError(`sugar "${sugar}" is not one of ${Object.keys(PRIMING_SUGARS).join(', ')}`);
  const residualVolumes = residualCo2(highestTemperature);
  const missing = Math.max(0, targetVolumes - residualVolumes);
  const gramsPerLitre = (missing * GRAMS_CO2_PER_VOLUME) / PRIMING_SUGARS[sugar];
  const impliedGaugeBar = gaugePressureForVolumes(Math.max(targetVolumes, residualVolumes), storageTemperature);
  return { residualVolumes, grams: gramsPerLitre * litres, gramsPerLitre, impliedGaugeBar, aboveCommonBottleLimit: impliedGaugeBar > COMMON_BOTTLE_LIMIT_BAR };
}
