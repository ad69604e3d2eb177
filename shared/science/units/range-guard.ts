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

/** Returns the value if it is finite and strictly above zero (a volume, a mass), else throws. */
export function requirePositive(parameter: string, value: number, unit = '', max = Number.MAX_VALUE): number {
  requireInRange(parameter, value, 0, max, unit);
  if (value === 0) throw new ScienceRangeError(parameter, value, 0, max, unit, 'below-range', `${parameter} = 0${unit ? ' ' + unit : ''} must be above 0`);
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
