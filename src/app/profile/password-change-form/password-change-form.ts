import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { PASSWORD_MIN_LENGTH } from '@shared/auth';
import { ChangePasswordRequest } from '@shared/profile';
import { confirmPasswordValidator } from '@app/auth/confirm-password-validator';
import { NewPasswordFields } from '@app/auth/new-password-fields/new-password-fields';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { onCountChange } from '@app/ui/on-count-change';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** The current password, then the new one typed twice. */
@Component({
  selector: 'cw-password-change-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatButton, NewPasswordFields],
  templateUrl: './password-change-form.html',
  styles: '.note { color: var(--mat-sys-on-surface-variant); font-size: 0.9rem; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PasswordChangeForm {
  readonly pending = input(false);
  readonly fieldErrors = input<FieldErrors | null>(null);
  /** Goes up by one per password changed; the form then clears. */
  readonly changedCount = input(0);
  readonly submitted = output<ChangePasswordRequest>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    currentPassword: ['', Validators.required],
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH)]],
    confirm: ['', [Validators.required, confirmPasswordValidator]],
  });

  constructor() {
    // The server names the new password `newPassword`; the form calls it `password`.
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors(), { newPassword: 'password' }));
    onCountChange(this.changedCount, () => this.form.reset());
  }

  protected submit(): void {
    if (this.pending()) return;
    this.form.controls.confirm.updateValueAndValidity();
    if (!readyToSubmit(this.form)) return;
    const { currentPassword, password } = this.form.getRawValue();
    this.submitted.emit({ currentPassword, newPassword: password });
  }
}
