/** Why a value was refused: not a number, below, or above the range an equation is valid over. */
export type ScienceRangeReason = 'not-a-number' | 'below-range' | 'above-range' | 'inconsistent';

/** Thrown when an input is NaN or outside the range an equation is valid over; never return NaN instead. */
export class ScienceRangeError extends RangeError {
  override readonly name = 'ScienceRangeError';

  constructor(
    readonly parameter: string,
    readonly value: number,
    readonly min: number,
    readonly max: number,
    readonly unit: string,
    readonly reason: ScienceRangeReason,
    detail?: string,
  ) {
    super(
      detail ??
        `${parameter} = ${value}${unit ? ' ' + unit : ''} is outside the allowed range ` +
          `${min} to ${max}${unit ? ' ' + unit : ''}`,
    );
  }
}
