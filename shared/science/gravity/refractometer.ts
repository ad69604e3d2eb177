import { requireInRange, requireNotAbove } from '../units/range-guard';
import type { DegreesBrix, SpecificGravity } from '../units/unit-types';
import { BRIX_MAX } from './brix';
import { platoFromSg, sgFromPlato } from './plato';

/** Wort correction factor used when none is measured (common practice). */
export const DEFAULT_WORT_CORRECTION = 1.04;

function requireFactor(factor: number): number {
  return requireInRange('wortCorrectionFactor', factor, 0.9, 1.2, '');
}

/** SG 20/20 °C of unfermented wort from a refractometer °Bx reading and a wort correction factor. */
export function sgFromRefractometer(brix: DegreesBrix, wortCorrectionFactor = DEFAULT_WORT_CORRECTION): SpecificGravity {
  requireInRange('brix', brix, 0, BRIX_MAX, '°Bx');
  return sgFromPlato(brix / requireFactor(wortCorrectionFactor));
}

/** Wort correction factor from a refractometer reading and a paired hydrometer SG of the same wort. */
export function wortCorrectionFactor(brix: DegreesBrix, hydrometerSg: SpecificGravity): number {
  requireInRange('brix', brix, 0.5, BRIX_MAX, '°Bx');
  requireInRange('hydrometerSg', hydrometerSg, 1.002, 1.2, 'SG');
  const plato = platoFromSg(hydrometerSg);
  return requireFactor(brix / plato);
}

/**
 * Gravity of fermenting wort from original and current refractometer °Bx: ethanol raises the
 * refractive index, so the reading must be corrected. Terrill's cubic (2011).
 */
export function alcoholCorrectedGravity(
  originalBrix: DegreesBrix, currentBrix: DegreesBrix, factor = DEFAULT_WORT_CORRECTION,
): SpecificGravity {
  requireInRange('originalBrix', originalBrix, 0, BRIX_MAX, '°Bx');
  requireInRange('currentBrix', currentBrix, 0, BRIX_MAX, '°Bx');
  requireNotAbove('currentBrix', currentBrix, 'originalBrix', originalBrix, '°Bx');
  const oi = originalBrix / requireFactor(factor);
  const fi = currentBrix / factor;
  return 1 - 0.0044993 * oi + 0.011774 * fi + 0.00027581 * oi * oi - 0.0012717 * fi * fi
    - 0.0000072800 * oi * oi * oi + 0.000063293 * fi * fi * fi;
}
