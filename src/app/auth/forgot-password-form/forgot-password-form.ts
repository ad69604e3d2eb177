import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** The e-mail address of the account whose password was forgotten. */
@Component({
  selector: 'cw-forgot-password-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatButton],
  templateUrl: './forgot-password-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ForgotPasswordForm {
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly submitted = output<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
  });

  protected submit(): void {
    if (!readyToSubmit(this.form, this.pending())) return;
    this.submitted.emit(this.form.getRawValue().email.trim());
  }
}
