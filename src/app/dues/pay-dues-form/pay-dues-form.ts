import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { describePlanPrice, DuesPlan, PayDuesRequest, TestCard } from '@shared/dues';
import { onCountChange } from '@app/ui/on-count-change';

/** A fresh key per payment attempt; a resend of the same attempt keeps it, so it is never charged twice. */
const newAttemptKey = () => crypto.randomUUID().replace(/-/g, '');

/** Choose a plan and a card and pay; in test mode the cards are the fake's test tokens, never a card number. */
@Component({
  selector: 'cw-pay-dues-form',
  imports: [ReactiveFormsModule, MatRadioGroup, MatRadioButton, MatCheckbox, MatButton],
  templateUrl: './pay-dues-form.html',
  styleUrl: './pay-dues-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PayDuesForm {
  readonly plans = input.required<DuesPlan[]>();
  readonly currentPlanId = input<number | null>(null);
  readonly testMode = input(false);
  readonly testCards = input<readonly TestCard[]>([]);
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  /** Goes up by one per successful payment: the next one is a new attempt. */
  readonly paymentsMade = input(0);
  readonly paymentSubmitted = output<PayDuesRequest>();

  protected readonly describe = describePlanPrice;
  protected readonly form = inject(NonNullableFormBuilder).group({
    planId: [0, [Validators.min(1)]],
    cardToken: ['', [Validators.required]],
    saveCardForRenewal: [false],
  });
  private attemptKey = newAttemptKey();

  constructor() {
    effect(() => {
      const chosen = this.currentPlanId() ?? this.plans()[0]?.id ?? 0;
      if (!this.form.controls.planId.value && chosen) this.form.controls.planId.setValue(chosen);
    });
    onCountChange(this.paymentsMade, () => {
      this.attemptKey = newAttemptKey();
      this.form.controls.cardToken.reset('');
    });
    // Another plan or card is another attempt.
    this.form.controls.planId.valueChanges.subscribe(() => (this.attemptKey = newAttemptKey()));
    this.form.controls.cardToken.valueChanges.subscribe(() => (this.attemptKey = newAttemptKey()));
  }

  protected submit(): void {
    if (this.pending()) return;
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.paymentSubmitted.emit({ ...this.form.getRawValue(), idempotencyKey: this.attemptKey });
  }
}
