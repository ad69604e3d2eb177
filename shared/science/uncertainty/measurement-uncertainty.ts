import { requireInRange } from '../units/range-guard';

/** Standard uncertainty of a reading limited by its resolution: rectangular, half-width res/2 → res/√12 (GUM 4.3.7). */
export function resolutionUncertainty(resolution: number): number {
  return requireInRange('resolution', resolution, 0, 100, '') / Math.sqrt(12);
}

/** A figure with its combined standard uncertainty and the expanded uncertainty at k = 2 (~95 %). */
export interface UncertainValue { value: number; standardUncertainty: number; expandedUncertainty: number }

/**
 * Propagates independent input uncertainties through f by the GUM law (first order), with
 * central-difference sensitivities; steps are a fraction of each uncertainty, so f's range holds.
 */
export function propagate(f: (inputs: number[]) => number, inputs: number[], uncertainties: number[]): UncertainValue {
  const value = f(inputs);
  let variance = 0;
  inputs.forEach((x, i) => {
    const u = uncertainties[i];
    if (u === 0) return;
    // A step far below u keeps the estimate local; the floor keeps it above rounding of x itself.
    const h = Math.max(u * 1e-3, Math.abs(x) * 1e-9, 1e-12);
    const up = inputs.slice();
    const down = inputs.slice();
    up[i] = x + h;
    down[i] = x - h;
    const sensitivity = (f(up) - f(down)) / (2 * h);
    variance += (sensitivity * u) ** 2;
  });
  const standardUncertainty = Math.sqrt(variance);
  return { value, standardUncertainty, expandedUncertainty: 2 * standardUncertainty };
}

/** Verdict on a declared figure: within tolerance even allowing for U, outside even so, or undecided. */
export type ToleranceVerdict = 'within' | 'outside' | 'undecided';

/** Whether a declared value is within ±tolerance of a measured one, given its expanded uncertainty. */
export function toleranceVerdict(declared: number, measured: UncertainValue, tolerance: number): ToleranceVerdict {
  requireInRange('tolerance', tolerance, 0, 100, '');
  requireInRange('declared', declared, -1e6, 1e6, '');
  requireInRange('measured', measured.value, -1e6, 1e6, '');
  requireInRange('expandedUncertainty', measured.expandedUncertainty, 0, 1e6, '');
  const gap = Math.abs(declared - measured.value);
  if (gap + measured.expandedUncertainty <= tolerance) return 'within';
  if (gap - measured.expandedUncertainty > tolerance) return 'outside';
  return 'undecided';
}
