import { platoFromSg } from '../gravity/plato';
import { pureEthanolDensity } from '../ethanol-water/oiml-density';
import { waterDensity } from '../water-density/tanaka-water-density';
import type { SpecificGravity } from '../units/unit-types';
import { abvLinearEstimate, abvNonLinearEstimate, requireGravityPair } from './abv-estimates';
import { alcoholByMass, realExtract } from './balling';

/** Every intermediate of the density-based strength, so the app can show the working. */
export interface StrengthBreakdown {
  originalExtract: number;
  apparentExtract: number;
  realExtract: number;
  apparentAttenuation: number;
  realAttenuation: number;
  alcoholByMass: number;
  beerDensity20: number;
  ethanolDensity20: number;
  percentVolume20: number;
  linearEstimate: number;
  /** Linear estimate minus the density-based % vol. */
  estimateGap: number;
  nonLinearEstimate: number;
  /** Non-linear estimate minus the density-based % vol. */
  nonLinearGap: number;
}

/**
 * Density-based % vol at 20 °C from OG and FG (SG 20/20 °C): Balling gives ABW, and
 * ABV = ABW × density of the beer ÷ density of pure ethanol, both at 20 °C.
 */
export function strengthBreakdown(og: SpecificGravity, fg: SpecificGravity): StrengthBreakdown {
  requireGravityPair(og, fg);
  const originalExtract = platoFromSg(og);
  const apparentExtract = platoFromSg(fg);
  const re = realExtract(originalExtract, apparentExtract);
  const abw = alcoholByMass(originalExtract, re);
  const beerDensity20 = fg * waterDensity(20);
  const ethanolDensity20 = pureEthanolDensity(20);
  const percentVolume20 = (abw * beerDensity20) / ethanolDensity20;
  const linearEstimate = abvLinearEstimate(og, fg);
  const nonLinearEstimate = abvNonLinearEstimate(og, fg);
  return {
    originalExtract, apparentExtract, realExtract: re,
    apparentAttenuation: (100 * (originalExtract - apparentExtract)) / originalExtract,
    realAttenuation: (100 * (originalExtract - re)) / originalExtract,
    alcoholByMass: abw, beerDensity20, ethanolDensity20, percentVolume20,
    linearEstimate, estimateGap: linearEstimate - percentVolume20,
    nonLinearEstimate, nonLinearGap: nonLinearEstimate - percentVolume20,
  };
}

/** Density-based % vol at 20 °C from OG and FG; the headline of strengthBreakdown. */
export function densityBasedAbv(og: SpecificGravity, fg: SpecificGravity): number {
  return strengthBreakdown(og, fg).percentVolume20;
}
