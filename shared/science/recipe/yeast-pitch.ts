import { requireInRange, requirePositive } from '../units/range-guard';
import type { DegreesPlato, Litres } from '../units/unit-types';

/** Pitching rates in million cells per mL per °P; common practice. */
export const PITCH_RATES = { ale: 0.75, hybrid: 1.0, lager: 1.5 } as const;

/** Kind of fermentation a pitching rate is chosen for. */
export type PitchStyle = keyof typeof PITCH_RATES;

/** Yeast cells to pitch, in billions: rate × mL × °P (rate in million cells/mL/°P). */
export function yeastCellsToPitch(litres: Litres, plato: DegreesPlato, ratePerMlPerPlato: number = PITCH_RATES.ale): number {
  requirePositive('litres', litres, 'L');
  requireInRange('plato', plato, 0, 40, '°P');
  requireInRange('ratePerMlPerPlato', ratePerMlPerPlato, 0.1, 5, 'million cells/mL/°P');
  return (ratePerMlPerPlato * litres * 1000 * plato) / 1000;
}
