import { analyseDistillate } from '../ethanol-water/distillate-analysis';
import type { Celsius, KgPerCubicMetre, Litres } from '../units/unit-types';
import { propagate, resolutionUncertainty, UncertainValue } from './measurement-uncertainty';

/** Resolutions of the instruments behind a distillate analysis (defaults: a 4-digit density meter, 0.1 °C, 0.1 mL flasks). */
export interface DistillateResolutions {
  densityResolution?: KgPerCubicMetre;
  thermometerResolution?: Celsius;
  volumeResolution?: Litres;
}

/** Beer % vol at 20 °C from a distillate analysis, with the uncertainty propagated from instrument resolution. */
export function distillateStrengthUncertainty(
  sampleVolume: Litres, madeUpVolume: Litres, distillateDensity: KgPerCubicMetre, temperature: Celsius,
  resolutions: DistillateResolutions = {},
): UncertainValue {
  const uVolume = resolutionUncertainty(resolutions.volumeResolution ?? 0.0001);
  const u = [uVolume, uVolume, resolutionUncertainty(resolutions.densityResolution ?? 0.1), resolutionUncertainty(resolutions.thermometerResolution ?? 0.1)];
  return propagate((v) => analyseDistillate(v[0], v[1], v[2], v[3]).beerPercentVolume20, [sampleVolume, madeUpVolume, distillateDensity, temperature], u);
}
