import { requireInRange } from '../units/range-guard';
import type { DegreesPlato, SpecificGravity } from '../units/unit-types';

// Extract scale used here: −3 °P (apparent extract of a very dry beer reads below zero) to 40 °P.
/** Lowest °P accepted (apparent extract of dry beers is negative). */
export const PLATO_MIN = -3;
/** Highest °P accepted. */
export const PLATO_MAX = 40;

// Plato's and Brix's tables both give sucrose % by mass at 20 °C and agree to a few hundredths
// over 0–40; one cubic fit of the sucrose table in SG 20/20 °C serves both (common practice).
// The shorter ASBC cubic drifts by ~0.15 °P near 40 °P, hence this one.
const P0 = -669.5622;
const P1 = 1262.7794;
const P2 = -775.6821;
const P3 = 182.4601;

function cubicPlato(sg: number): number {
  return ((P3 * sg + P2) * sg + P1) * sg + P0;
}

/** Inverts a monotone cubic in SG by Newton from a linear start; its slope is near 259 °P per SG unit throughout. */
function invertGravityCubic(target: number, value: (sg: number) => number, slope: (sg: number) => number): number {
  let sg = 1 + target / 259;
  for (let i = 0; i < 20; i++) {
    const step = (value(sg) - target) / slope(sg);
    sg -= step;
    if (Math.abs(step) < 1e-12) break;
  }
  return sg;
}

/** Lowest and highest SG (20/20 °C) accepted, the ends of the °P range. */
export const SG_MIN = invertGravityCubic(PLATO_MIN, cubicPlato, cubicSlope);
export const SG_MAX = invertGravityCubic(PLATO_MAX, cubicPlato, cubicSlope);

/** Slope d°P/dSG of the cubic. */
function cubicSlope(sg: number): number {
  return (3 * P3 * sg + 2 * P2) * sg + P1;
}

/** °Plato from specific gravity 20/20 °C (sucrose-table cubic). */
export function platoFromSg(sg: SpecificGravity): DegreesPlato {
  requireInRange('sg', sg, SG_MIN - 1e-9, SG_MAX + 1e-9, 'SG 20/20');
  return cubicPlato(sg);
}

/** Specific gravity 20/20 °C from °Plato (inverse of the sucrose-table cubic). */
export function sgFromPlato(plato: DegreesPlato): SpecificGravity {
  requireInRange('plato', plato, PLATO_MIN, PLATO_MAX, '°P');
  return invertGravityCubic(plato, cubicPlato, cubicSlope);
}
