import { requireInRange } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre, MassFraction } from '../units/unit-types';
import { evaluateOimlPolynomial, oimlCoefficientsInP, requireOimlRange } from './oiml-density';

/** Mass-fraction tolerance the inverse solvers stop at. */
export const MASS_FRACTION_TOLERANCE = 1e-10;

const coefficients = new Float64Array(12);

// Rounding makes the polynomial wobble by ~1e-12 kg/m³ at the ends; a reading that far past an
// end is that end, not an error.
const END_SLACK = 1e-6;

/**
 * Root of f(p) = sum c_k p^k − target on [0, 1] by Newton steps kept inside a shrinking
 * bracket (bisection when a step leaves it); f is monotone over the range, so the bracket holds.
 * The start comes from `guess` given where the target sits between the two ends (0 to 1).
 */
function solveInP(target: number, weightByP: boolean, guess: (share: number) => number = (share) => share): number {
  const c = coefficients;
  let lo = 0;
  let hi = 1;
  let fLo = (weightByP ? 0 : c[0]) - target;
  let fHi = -target;
  for (let k = 0; k < 12; k++) fHi += c[k];
  if (fLo === 0 || (fLo > 0) === (fHi > 0)) return Math.abs(fLo) <= Math.abs(fHi) ? 0 : 1;
  if (fHi === 0) return 1;
  let p = guess(fLo / (fLo - fHi));
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
    if (Math.abs(next - p) < MASS_FRACTION_TOLERANCE) return Math.min(1, Math.max(0, next));
    p = next;
  }
  return p;
}

// The curve p(share of the way from water to ethanol density) has nearly the same shape at every
// temperature; sampled once at 20 °C it starts Newton within ~1e-3, so two or three steps finish.
const GUIDE_NODES = 64;
let guide: Float64Array | undefined;

function buildGuide(): Float64Array {
  const table = new Float64Array(GUIDE_NODES + 1);
  oimlCoefficientsInP(0, coefficients);
  const water = coefficients[0];
  let ethanol = 0;
  for (let k = 0; k < 12; k++) ethanol += coefficients[k];
  for (let j = 0; j <= GUIDE_NODES; j++) table[j] = solveInP(water + (ethanol - water) * (j / GUIDE_NODES), false);
  return table;
}

function guideGuess(share: number): number {
  guide ??= buildGuide();
  const position = Math.min(Math.max(share, 0), 1) * GUIDE_NODES;
  const j = Math.min(Math.floor(position), GUIDE_NODES - 1);
  return guide[j] + (guide[j + 1] - guide[j]) * (position - j);
}

/** Inverse of the OIML R 22 equation: mass fraction from density and temperature, to 1e-10. */
export function massFractionFromDensity(density: KgPerCubicMetre, temperature: Celsius): MassFraction {
  requireOimlRange(0, temperature);
  if (!guide) guide = buildGuide();
  // The pure-end densities come free from the coefficients: c0 at p = 0, their sum at p = 1.
  oimlCoefficientsInP(temperature - 20, coefficients);
  const water = coefficients[0];
  let ethanol = 0;
  for (let k = 0; k < 12; k++) ethanol += coefficients[k];
  requireInRange('density', density, ethanol - END_SLACK, water + END_SLACK, 'kg/m³');
  return solveInP(density, false, guideGuess);
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
