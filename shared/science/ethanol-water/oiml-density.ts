import { requireInRange } from '../units/range-guard';
import type { Celsius, KgPerCubicMetre, MassFraction } from '../units/unit-types';
import { OIML_A, OIML_B, OIML_C } from './oiml-coefficients';

/** Temperature range over which the equation is used here, °C. */
export const OIML_T_MIN = 0;
export const OIML_T_MAX = 40;

const A = Float64Array.from(OIML_A);
const B = Float64Array.from(OIML_B);
const C = OIML_C.map((row) => Float64Array.from(row));

/** Bare OIML R 22 polynomial without input checks (tau = t − 20 °C); the bench baseline. */
export function evaluateOimlPolynomial(p: number, tau: number): number {
  let a = A[11];
  for (let k = 10; k >= 0; k--) a = a * p + A[k];
  let b = B[5];
  for (let k = 4; k >= 0; k--) b = b * tau + B[k];
  let c = 0;
  for (let i = C.length - 1; i >= 0; i--) {
    const row = C[i];
    let s = row[row.length - 1];
    for (let k = row.length - 2; k >= 0; k--) s = s * p + row[k];
    c = c * tau + s * p;
  }
  return a + b * tau + c * tau;
}

/**
 * Fills out[0..11] with the coefficients of rho as a polynomial in p at a fixed tau,
 * so a solver can evaluate value and slope with one Horner pass per step.
 */
export function oimlCoefficientsInP(tau: number, out: Float64Array): void {
  for (let k = 0; k < 12; k++) out[k] = A[k];
  let b = B[5];
  for (let k = 4; k >= 0; k--) b = b * tau + B[k];
  out[0] += b * tau;
  let tauPower = tau;
  for (let i = 0; i < C.length; i++) {
    const row = C[i];
    for (let k = 0; k < row.length; k++) out[k + 1] += row[k] * tauPower;
    tauPower *= tau;
  }
}

/** Checks a mass fraction and temperature against the equation's range. */
export function requireOimlRange(massFraction: number, temperature: number): void {
  requireInRange('massFraction', massFraction, 0, 1, '');
  requireInRange('temperature', temperature, OIML_T_MIN, OIML_T_MAX, '°C');
}

/** Density of an ethanol–water mixture from mass fraction and temperature (OIML R 22), kg/m³. */
export function ethanolWaterDensity(massFraction: MassFraction, temperature: Celsius): KgPerCubicMetre {
  requireOimlRange(massFraction, temperature);
  return evaluateOimlPolynomial(massFraction, temperature - 20);
}

/** Density of pure ethanol at t by the OIML R 22 equation at p = 1, kg/m³. */
export function pureEthanolDensity(temperature: Celsius): KgPerCubicMetre {
  return ethanolWaterDensity(1, temperature);
}

/** Density of pure water at t by the OIML R 22 equation at p = 0, kg/m³. */
export function oimlWaterDensity(temperature: Celsius): KgPerCubicMetre {
  return ethanolWaterDensity(0, temperature);
}
