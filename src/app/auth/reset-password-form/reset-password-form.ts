import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { PASSWORD_MIN_LENGTH } from '@shared/auth';
import { confirmPasswordValidator } from '../confirm-password-validator';
import { NewPasswordFields } from '../new-password-fields/new-password-fields';

/** A new password, typed twice. */
@Component({
  selector: 'cw-reset-password-form',
  imports: [ReactiveFormsModule, NewPasswordFields, MatButton],
  templateUrl: './reset-password-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResetPasswordForm {
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly submitted = output<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH)]],
    confirm: ['', [Validators.required, confirmPasswordValidator]],
  });

  protected submit(): void {
    if (this.pending()) {
      return;
    }
    this.form.controls.confirm.updateValueAndValidity();
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitted.emit(this.form.getRawValue().password);
  }
}
