import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { DuesPayment, formatDuesAmount } from '@shared/dues';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** Payments, newest first; for admins each card or cash payment can be refunded after a second click. */
@Component({
  selector: 'cw-dues-payment-list',
  imports: [MatButton, ZonedDateTimePipe],
  templateUrl: './dues-payment-list.html',
  styleUrl: './dues-payment-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DuesPaymentList {
  readonly payments = input.required<DuesPayment[]>();
  readonly timeZone = input.required<string>();
  readonly showMember = input(false);
  readonly refundable = input(false);
  readonly pending = input(false);
  readonly refundConfirmed = output<number>();

  protected readonly amount = formatDuesAmount;
  protected readonly confirmingId = signal<number | null>(null);

  protected refund(paymentId: number): void {
    this.confirmingId.set(null);
    this.refundConfirmed.emit(paymentId);
  }
}
