import { requireInRange } from '../units/range-guard';

/**
 * Redlich–Kister expansion of the excess molar volume, V_E = x(1−x)·Σ A_k·L_k(2x−1), written on
 * Legendre polynomials L_k instead of plain powers (2x−1)^k: the same family of curves, but
 * nearly orthogonal terms, so a high-order fit stays well conditioned.
 */
export function redlichKisterBasis(x: number, order: number, out: number[] = []): number[] {
  const u = 2 * x - 1;
  const w = x * (1 - x);
  let previous = 1;
  let current = u;
  out[0] = w;
  if (order >= 1) out[1] = w * u;
  for (let k = 1; k < order; k++) {
    const next = ((2 * k + 1) * u * current - k * previous) / (k + 1);
    previous = current;
    current = next;
    out[k + 1] = w * next;
  }
  out.length = order + 1;
  return out;
}

/** Excess molar volume of a Redlich–Kister expansion (Legendre form) at mole fraction x, cm³/mol. */
export function redlichKisterExcessVolume(x: number, coefficients: readonly number[]): number {
  requireInRange('moleFraction', x, 0, 1, '');
  coefficients.forEach((c, k) => requireInRange(`coefficients[${k}]`, c, -1e6, 1e6, 'cm³/mol'));
  const basis = redlichKisterBasis(x, coefficients.length - 1);
  let sum = 0;
  for (let k = 0; k < coefficients.length; k++) sum += coefficients[k] * basis[k];
  return sum;
}
