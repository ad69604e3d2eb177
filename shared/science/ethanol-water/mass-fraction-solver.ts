import { requireInRange } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre, MassFraction } from '../units/unit-types';
import { evaluateOimlPolynomial, oimlCoefficientsInP, requireOimlRange } from './oiml-density';
import { guessMassFraction } from './density-guide';

/** Mass-fraction tolerance the inverse solvers stop at. */
export const MASS_FRACTION_TOLERANCE = 1e-10;

const coefficients = new Float64Array(12);
const NEWTON_LAST_STEP = 1e-6;

// Rounding makes the polynomial wobble by ~1e-12 kg/m³ at the ends; a reading that far past an
// end is that end, not an error.
const END_SLACK = 1e-6;

/**
 * Root of f(p) = sum c_k p^k − target on [0, 1] by Newton steps kept inside a shrinking
 * bracket (bisection when a step leaves it); f is monotone over the range, so the bracket holds.
 * The start is the guide curve at `guideTemperature` when given, else the share of the way
 * the target sits between the two ends.
 */
function solveInP(target: number, weightByP: boolean, guideTemperature?: number): number {
  const c = coefficients;
  let lo = 0;
  let hi = 1;
  let fLo = (weightByP ? 0 : c[0]) - target;
  let fHi = -target;
  for (let k = 0; k < 12; k++) fHi += c[k];
  if (fLo === 0 || (fLo > 0) === (fHi > 0)) return Math.abs(fLo) <= Math.abs(fHi) ? 0 : 1;
  if (fHi === 0) return 1;
  const share = fLo / (fLo - fHi);
  let p = guideTemperature === undefined ? share : guessMassFraction(share, guideTemperature);
  for (let iteration = 0; iteration < 60; iteration++) {
    let value = c[11];
    let slope = 0;
    for (let k = 10; k >= 0; k--) {
      slope = slope * p + value;
      value = value * p + c[k];
    }
    if (weightByP) {
      slope = value + p * slope;
      value *= p;
    }
    const f = value - target;
    if (f === 0) return p;
    if ((f > 0) === (fLo > 0)) { lo = p; fLo = f; } else { hi = p; fHi = f; }
    let next = p - f / slope;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    // Newton's error after a step of size d is about (f''/2f')·d², with f''/2f' below ~10 here:
    // a step under 1e-6 leaves an error under 1e-11, so no further evaluation is needed.
    if (Math.abs(next - p) < NEWTON_LAST_STEP) return Math.min(1, Math.max(0, next));
    p = next;
  }
  return p;
}

/** Inverse of the OIML R 22 equation: mass fraction from density and temperature, to 1e-10. */
export function massFractionFromDensity(density: KgPerCubicMetre, temperature: Celsius): MassFraction {
  requireOimlRange(0, temperature);
  // The pure-end densities come free from the coefficients: c0 at p = 0, their sum at p = 1.
  oimlCoefficientsInP(temperature - 20, coefficients);
  const water = coefficients[0];
  let ethanol = 0;
  for (let k = 0; k < 12; k++) ethanol += coefficients[k];
  requireInRange('density', density, ethanol - END_SLACK, water + END_SLACK, 'kg/m³');
  return solveInP(density, false, temperature);
}

/**
 * Mass fraction whose ethanol mass per mixture volume, p·rho, equals the target (kg/m³);
 * the inverse behind % vol and g/L.
 */
export function massFractionFromEthanolConcentration(gramsPerLitre: number, temperature: Celsius): MassFraction {
  requireOimlRange(0, temperature);
  const tau = temperature - 20;
  const ethanol = evaluateOimlPolynomial(1, tau);
  requireInRange('ethanolConcentration', gramsPerLitre, 0, ethanol + END_SLACK, 'g/L');
  oimlCoefficientsInP(tau, coefficients);
  return solveInP(gramsPerLitre, true);
}
