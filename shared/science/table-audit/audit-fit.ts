import { leverage, solveLeastSquares } from './least-squares';
import { redlichKisterBasis } from './redlich-kister';

/**
 * One row prepared for fitting: z is the composition the expansion runs in (mole or mass
 * fraction), amount the mass of one unit of mixture (mean molar mass in g/mol for a molar basis,
 * 1 g for a specific basis), and volume = 1000·amount/density in cm³ per unit.
 */
export interface FitPoint {
  z: number;
  amount: number;
  density: number;
  volume: number;
}

/** A fit of V = z·V_ethanol + (1−z)·V_water + Redlich–Kister excess, with the pure volumes free. */
export interface VolumeFit {
  ethanolVolume: number;
  waterVolume: number;
  coefficients: number[];
  /** Leverage of each point in the fit; for a point left out, its prediction-variance factor. */
  leverages: number[];
}

/** Fitted volume per unit at composition z, cm³. */
export function fittedVolume(fit: VolumeFit, z: number): number {
  const basis = redlichKisterBasis(z, fit.coefficients.length - 1);
  let v = z * fit.ethanolVolume + (1 - z) * fit.waterVolume;
  for (let k = 0; k < basis.length; k++) v += fit.coefficients[k] * basis[k];
  return v;
}

/** Density residual (observed − fitted, kg/m³) of a point under a fit. */
export function densityResidual(fit: VolumeFit, point: FitPoint): number {
  return point.density - (1000 * point.amount) / fittedVolume(fit, point.z);
}

/**
 * Least-squares fit over the active points. Each row is weighted by dρ/dV = ρ²/(1000·amount), so the
 * fit minimises density residuals: a table's printing error is uniform in density, not in volume.
 */
export function fitVolumes(points: readonly FitPoint[], active: readonly boolean[], order: number): VolumeFit {
  const design = points.map((p) => {
    const weight = (p.density * p.density) / (1000 * p.amount);
    return [p.z * weight, (1 - p.z) * weight, ...redlichKisterBasis(p.z, order).map((b) => b * weight)];
  });
  const rows = design.filter((_, i) => active[i]);
  const rhs = points.filter((_, i) => active[i]).map((p) => (p.volume * p.density * p.density) / (1000 * p.amount));
  const { coefficients: c, r } = solveLeastSquares(rows, rhs);
  const leverages = design.map((row) => leverage(r, row));
  return { ethanolVolume: c[0], waterVolume: c[1], coefficients: c.slice(2), leverages };
}

/** Robust scale of residuals: 1.4826 × median absolute residual (the normal-consistent MAD about zero). */
export function robustScale(residuals: readonly number[]): number {
  const sorted = residuals.map(Math.abs).sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  const median = sorted.length % 2 ? sorted[mid] : 0.5 * (sorted[mid - 1] + sorted[mid]);
  return 1.4826 * median;
}
