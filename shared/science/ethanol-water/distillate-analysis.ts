import { requireInRange, requirePositive } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre, Litres } from '../units/unit-types';
import { massFractionFromDensity } from './mass-fraction-solver';
import { percentVolumeFromMassFraction } from './concentration';

/** Every step of a distillate analysis, so the app can show the working. */
export interface DistillateAnalysis {
  distillateMassFraction: number;
  distillatePercentVolume20: number;
  beerPercentVolume20: number;
  /** Above the strength of any beer (20 % vol): a mix-up of sample or volumes, to be checked before use. */
  aboveBeerRange: boolean;
}

/** Strength above which a "beer" figure points to a mistake rather than a beer. */
export const BEER_STRENGTH_LIMIT = 20;

/**
 * Beer % vol at 20 °C from its distillate: the sample (volume at 20 °C) is distilled and the
 * distillate made up to a known volume at 20 °C, whose density is read at t. Ethanol volume at
 * 20 °C is conserved, so the beer's % vol is the distillate's scaled by the volume ratio.
 */
export function analyseDistillate(
  sampleVolume: Litres, madeUpVolume: Litres, distillateDensity: KgPerCubicMetre, temperature: Celsius,
): DistillateAnalysis {
  requirePositive('sampleVolume', sampleVolume, 'L');
  requirePositive('madeUpVolume', madeUpVolume, 'L');
  requireInRange('madeUpVolume', madeUpVolume, 0, sampleVolume * 10, 'L');
  const distillateMassFraction = massFractionFromDensity(distillateDensity, temperature);
  const distillatePercentVolume20 = percentVolumeFromMassFraction(distillateMassFraction, 20);
  const beerPercentVolume20 = (distillatePercentVolume20 * madeUpVolume) / sampleVolume;
  return { distillateMassFraction, distillatePercentVolume20, beerPercentVolume20, aboveBeerRange: beerPercentVolume20 > BEER_STRENGTH_LIMIT };
}
