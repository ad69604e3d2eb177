import { ChangeDetectionStrategy, Component, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { describePlanPrice, DUES_LIMITS, DuesLedgerMember, DuesPlan, RecordCashPaymentRequest } from '@shared/dues';
import { onCountChange } from '@app/ui/on-count-change';

const newKey = () => crypto.randomUUID().replace(/-/g, '');

/** An officer notes dues handed over in cash: who, which plan, and a note. */
@Component({
  selector: 'cw-cash-payment-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSelect, MatOption, MatInput, MatButton],
  templateUrl: './cash-payment-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CashPaymentForm {
  readonly members = input.required<DuesLedgerMember[]>();
  readonly plans = input.required<DuesPlan[]>();
  readonly pending = input(false);
  /** Goes up with each saved ledger change; the form then clears. */
  readonly savedCount = input(0);
  readonly cashPaymentSubmitted = output<RecordCashPaymentRequest>();

  protected readonly describe = describePlanPrice;
  protected readonly noteMax = DUES_LIMITS.cashNoteMax;
  protected readonly form = inject(NonNullableFormBuilder).group({
    userId: [0, [Validators.min(1)]],
    planId: [0, [Validators.min(1)]],
    note: ['', [Validators.maxLength(DUES_LIMITS.cashNoteMax)]],
  });
  private key = newKey();

  constructor() {
    onCountChange(this.savedCount, () => {
      this.key = newKey();
      this.form.reset({ userId: 0, planId: 0, note: '' });
    });
  }

  protected submit(): void {
    if (this.pending()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.cashPaymentSubmitted.emit({ ...this.form.getRawValue(), idempotencyKey: this.key });
  }
}
