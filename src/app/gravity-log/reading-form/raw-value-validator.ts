import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { GravityUnit, READING_LIMITS, UNIT_LABELS } from '@shared/readings';

/** The raw value must lie in its unit's range (the same limits the server checks). */
export function rawValueInRange(unitOf: () => GravityUnit): ValidatorFn {
  return (control: AbstractControl<number | null>): ValidationErrors | null => {
    if (control.value === null || control.value === undefined) return null;
    const unit = unitOf();
    const { min, max } = READING_LIMITS.rawValue[unit];
    return control.value < min || control.value > max ? { range: `Between ${min} and ${max} ${UNIT_LABELS[unit]}.` } : null;
  };
}
