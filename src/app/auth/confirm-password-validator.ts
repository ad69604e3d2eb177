import { AbstractControl, ValidationErrors } from '@angular/forms';

/** Validator for a "confirm password" control: it must repeat its sibling `password` control. */
export function confirmPasswordValidator(control: AbstractControl): ValidationErrors | null {
  const password = control.parent?.get('password')?.value;
  return control.value && control.value !== password ? { passwordMismatch: true } : null;
}
