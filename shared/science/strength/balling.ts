import type { DegreesPlato } from '../units/unit-types';
import { requireExtractPair } from './attenuation';

/** Real extract (°P) from original and apparent extract by Balling's relation RE = 0.1808·OE + 0.8192·AE. */
export function realExtract(originalExtract: DegreesPlato, apparentExtract: DegreesPlato): DegreesPlato {
  requireExtractPair(originalExtract, apparentExtract, 'apparentExtract');
  return 0.1808 * originalExtract + 0.8192 * apparentExtract;
}

/**
 * Alcohol by mass (% m/m) from original and real extract by Balling's relation: 2.0665 g of
 * extract yield 1 g of ethanol, with the OE-dependent term for the wort's starting mass.
 */
export function alcoholByMass(originalExtract: DegreesPlato, realExtractValue: DegreesPlato): number {
  requireExtractPair(originalExtract, realExtractValue, 'realExtract');
  return (originalExtract - realExtractValue) / (2.0665 - 0.010665 * originalExtract);
}
