import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { AcceptInvitationRequest, PASSWORD_MIN_LENGTH } from '@shared/auth';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { confirmPasswordValidator } from '../confirm-password-validator';
import { NewPasswordFields } from '../new-password-fields/new-password-fields';

/** The invited person's name and a password, typed twice. */
@Component({
  selector: 'cw-accept-invitation-form',
  imports: [ReactiveFormsModule, NewPasswordFields, MatFormField, MatLabel, MatHint, MatError, MatInput, MatButton],
  templateUrl: './accept-invitation-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitationForm {
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly submitted = output<AcceptInvitationRequest>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(100)]],
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH)]],
    confirm: ['', [Validators.required, confirmPasswordValidator]],
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
  }

  protected submit(): void {
    if (this.pending()) {
      return;
    }
    this.form.controls.confirm.updateValueAndValidity();
    const name = this.form.controls.name.value.trim();
    if (this.form.invalid || !name) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitted.emit({ name, password: this.form.controls.password.value });
  }
}
