import { ScienceRangeError } from './science-range-error';

/** Returns the value if it is a finite number within [min, max], else throws ScienceRangeError. */
export function requireInRange(parameter: string, value: number, min: number, max: number, unit = ''): number {
  if (typeof value !== 'number' || Number.isNaN(value)) {
    throw new ScienceRangeError(parameter, value, min, max, unit, 'not-a-number');
  }
  if (value < min) throw new ScienceRangeError(parameter, value, min, max, unit, 'below-range');
  if (value > max) throw new ScienceRangeError(parameter, value, min, max, unit, 'above-range');
  return value;
}

// Smallest amount accepted where zero is meaningless: far below any real volume or mass, far above
// the sub-normal numbers whose products underflow to 0/0.
const SMALLEST_AMOUNT = 1e-9;

/** Returns the value if it is a finite amount above zero (a volume, a mass), else throws. */
export function requirePositive(parameter: string, value: number, unit = '', max = 1e12): number {
  requireInRange(parameter, value, 0, max, unit);
  if (value < SMALLEST_AMOUNT) {
    throw new ScienceRangeError(parameter, value, SMALLEST_AMOUNT, max, unit, 'below-range', `${parameter} = ${value}${unit ? ' ' + unit : ''} must be above 0`);
  }
  return value;
}

/** Throws when a later reading is above an earlier one (FG above OG, current Bx above original). */
export function requireNotAbove(parameter: string, value: number, limitName: string, limit: number, unit = ''): number {
  if (value > limit) {
    throw new ScienceRangeError(
      parameter, value, -Infinity, limit, unit, 'inconsistent',
      `${parameter} = ${value}${unit ? ' ' + unit : ''} must not be above ${limitName} = ${limit}${unit ? ' ' + unit : ''}`,
    );
  }
  return value;
}
