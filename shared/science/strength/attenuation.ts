import { requireInRange, requireNotAbove } from '../units/range-guard';
import type { DegreesPlato } from '../units/unit-types';
import { PLATO_MAX, PLATO_MIN } from '../gravity/plato';

/** Checks an original and a later extract (°P): OE above zero, later not above it. */
export function requireExtractPair(original: DegreesPlato, later: DegreesPlato, laterName: string): void {
  requireInRange('originalExtract', original, 0.5, PLATO_MAX, '°P');
  requireInRange(laterName, later, PLATO_MIN, PLATO_MAX, '°P');
  requireNotAbove(laterName, later, 'originalExtract', original, '°P');
}

/** Apparent attenuation, %, from original and apparent extract (°P). */
export function apparentAttenuation(originalExtract: DegreesPlato, apparentExtract: DegreesPlato): number {
  requireExtractPair(originalExtract, apparentExtract, 'apparentExtract');
  return (100 * (originalExtract - apparentExtract)) / originalExtract;
}

/** Real attenuation, %, from original and real extract (°P). */
export function realAttenuation(originalExtract: DegreesPlato, realExtract: DegreesPlato): number {
  requireExtractPair(originalExtract, realExtract, 'realExtract');
  return (100 * (originalExtract - realExtract)) / originalExtract;
}
