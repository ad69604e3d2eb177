import { AbstractControl } from '@angular/forms';

/**
 * The check a form's submit starts with: nothing is sent while its request is in flight (a second
 * press is simply ignored), and an invalid form shows every field's message instead of sending.
 */
export function readyToSubmit(form: AbstractControl, pending = false): boolean {
  if (pending) return false;
  if (form.invalid) {
    form.markAllAsTouched();
    return false;
  }
  return true;
}
