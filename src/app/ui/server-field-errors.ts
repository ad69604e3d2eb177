import { FormGroup } from '@angular/forms';

/** Reasons per form field, as the server gave them in a 400 answer (`fields`). */
export type FieldErrors = Record<string, string>;

/**
 * Puts the server's reasons on the matching controls as a `server` error, so they show at the field;
 * they clear by themselves when the person edits the field. `controlNames` maps a field the API
 * names otherwise to the form's control (a booking's `start` is its `startDate` picker).
 */
export function applyServerFieldErrors(form: FormGroup, fields: FieldErrors | null, controlNames: Record<string, string> = {}): void {
  for (const [name, reason] of Object.entries(fields ?? {})) {
    const control = form.get(controlNames[name] ?? name);
    if (control) {
      control.setErrors({ ...control.errors, server: reason });
      control.markAsTouched();
    }
  }
}
