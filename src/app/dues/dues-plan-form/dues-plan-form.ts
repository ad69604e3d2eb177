import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { CreateDuesPlanRequest, DUES_CURRENCIES, DUES_LIMITS, DUES_PERIODS } from '@shared/dues';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { onCountChange } from '@app/ui/on-count-change';

/** A new plan: name, amount in the major unit (converted to cents on the way out), currency and period. */
@Component({
  selector: 'cw-dues-plan-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatSelect, MatOption, MatButton],
  templateUrl: './dues-plan-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesPlanForm {
  readonly pending = input(false);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly savedCount = input(0);
  readonly planSubmitted = output<CreateDuesPlanRequest>();

  protected readonly currencies = DUES_CURRENCIES;
  protected readonly periods = DUES_PERIODS;
  protected readonly limits = { nameMax: DUES_LIMITS.planNameMax, min: DUES_LIMITS.amountMinCents / 100, max: DUES_LIMITS.amountMaxCents / 100 };
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(DUES_LIMITS.planNameMax)]],
    amount: [12, [Validators.required, Validators.min(this.limits.min), Validators.max(this.limits.max)]],
    currency: ['EUR' as CreateDuesPlanRequest['currency']],
    period: ['month' as CreateDuesPlanRequest['period']],
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
    onCountChange(this.savedCount, () => this.form.reset());
  }

  protected submit(): void {
    if (this.pending()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { name, amount, currency, period } = this.form.getRawValue();
    this.planSubmitted.emit({ name: name.trim(), amountCents: Math.round(amount * 100), currency, period });
  }
}
