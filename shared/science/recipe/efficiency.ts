import { requireInRange, requirePositive } from '../units/range-guard';
import type { Litres } from '../units/unit-types';

/**
 * Mash efficiency (extract in the kettle after the boil over the grains' potential) implied by a brewhouse
 * efficiency into the fermenter: the wort left in the kettle carried extract too (common practice).
 */
export function mashEfficiencyFromBrewhouse(brewhouseEfficiencyPercent: number, intoFermenterLitres: Litres, kettleLossLitres: Litres): number {
  requireInRange('brewhouseEfficiencyPercent', brewhouseEfficiencyPercent, 1, 100, '%');
  requirePositive('intoFermenterLitres', intoFermenterLitres, 'L');
  requireInRange('kettleLossLitres', kettleLossLitres, 0, 1e5, 'L');
  return (brewhouseEfficiencyPercent * (intoFermenterLitres + kettleLossLitres)) / intoFermenterLitres;
}
