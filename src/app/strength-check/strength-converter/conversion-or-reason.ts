import { convertStrength, STRENGTH_QUANTITY_LIMITS, StrengthConversion, StrengthQuantity } from '@shared/strength-check';
import { ScienceRangeError } from '@shared/science';

/** A conversion, or the reason it cannot be made, in words for the form. */
export type ConversionOutcome = { conversion: StrengthConversion; reason: null } | { conversion: null; reason: string };

/** Converts when the inputs are complete and in range; otherwise says what is wrong. */
export function conversionOrReason(quantity: StrengthQuantity, value: number | null, temperature: number | null): ConversionOutcome {
  if (value === null || temperature === null) return { conversion: null, reason: 'Enter a value and a temperature.' };
  const limit = STRENGTH_QUANTITY_LIMITS[quantity];
  if (value < limit.min || value > limit.max) return { conversion: null, reason: `${limit.label} must be from ${limit.min} to ${limit.max}${limit.unit ? ' ' + limit.unit : ''}.` };
  try {
    return { conversion: convertStrength(quantity, value, temperature), reason: null };
  } catch (error) {
    if (error instanceof ScienceRangeError) return { conversion: null, reason: `Out of range: ${error.message}.` };
    throw error;
  }
}
