import { requireInRange } from '../units/range-guard';
import type { DegreesBrix, SpecificGravity } from '../units/unit-types';
import { platoFromSg, sgFromPlato } from './plato';

/** Lowest and highest °Bx accepted. */
export const BRIX_MIN = 0;
export const BRIX_MAX = 40;

// °Bx and °P are both sucrose % by mass at 20 °C; the scales share one cubic (see plato.ts).

/** °Brix from specific gravity 20/20 °C. */
export function brixFromSg(sg: SpecificGravity): DegreesBrix {
  requireInRange('sg', sg, 0.99999, 1.2, 'SG 20/20');
  return Math.min(BRIX_MAX, Math.max(0, platoFromSg(sg)));
}

/** Specific gravity 20/20 °C from °Brix. */
export function sgFromBrix(brix: DegreesBrix): SpecificGravity {
  requireInRange('brix', brix, BRIX_MIN, BRIX_MAX, '°Bx');
  return sgFromPlato(brix);
}
