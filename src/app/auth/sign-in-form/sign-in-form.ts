import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { SignInRequest } from '@shared/auth';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { retryAfterText } from '../retry-after-text';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** E-mail and password, checked at the field before they are sent. */
@Component({
  selector: 'cw-sign-in-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatButton],
  templateUrl: './sign-in-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignInForm {
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly retryAfterSeconds = input<number | null>(null);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly submitted = output<SignInRequest>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', Validators.required],
  });
  protected readonly retryText = computed(() => {
    const seconds = this.retryAfterSeconds();
    return seconds === null ? null : retryAfterText(seconds);
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
  }

  protected submit(): void {
    // The button stays enabled (and focused) while waiting; a second press is simply ignored.
    if (!readyToSubmit(this.form, this.pending())) return;
    const { email, password } = this.form.getRawValue();
    this.submitted.emit({ email: email.trim(), password });
  }
}
