import { platoFromSg } from '../gravity/plato';
import { restatePercentVolume } from '../ethanol-water/concentration';
import { pureEthanolDensity } from '../ethanol-water/oiml-density';
import { requireInRange } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre, SpecificGravity } from '../units/unit-types';
import { requireGravityPair } from './abv-estimates';
import { alcoholByMass, realExtract } from './balling';

/** The working of a strength from a beer density measured at t (a density meter), reported at 20 °C. */
export interface MeasuredDensityStrength {
  originalExtract: number;
  apparentExtract: number;
  realExtract: number;
  alcoholByMass: number;
  beerDensity: number;
  temperature: number;
  ethanolDensity: number;
  percentVolumeAtT: number;
  percentVolume20: number;
}

/**
 * % vol = ABW × beer density at t ÷ pure-ethanol density at t, restated to 20 °C. The restatement
 * treats the beer's ethanol and water as an ethanol–water mixture: the extract's own expansion is
 * close to water's, so its effect on a ~0.05 % vol correction is negligible.
 */
export function strengthFromBeerDensity(
  og: SpecificGravity, fg: SpecificGravity, beerDensity: KgPerCubicMetre, temperature: Celsius,
): MeasuredDensityStrength {
  requireGravityPair(og, fg);
  requireInRange('beerDensity', beerDensity, 950, 1200, 'kg/m³');
  const originalExtract = platoFromSg(og);
  const apparentExtract = platoFromSg(fg);
  const re = realExtract(originalExtract, apparentExtract);
  const abw = alcoholByMass(originalExtract, re);
  const ethanolDensity = pureEthanolDensity(temperature);
  const percentVolumeAtT = (abw * beerDensity) / ethanolDensity;
  return {
    originalExtract, apparentExtract, realExtract: re, alcoholByMass: abw, beerDensity, temperature, ethanolDensity,
    percentVolumeAtT, percentVolume20: restatePercentVolume(percentVolumeAtT, temperature, 20),
  };
}
