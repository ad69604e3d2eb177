import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { Booking } from '@shared/bookings';

/** The signed-in person's bookings that have not ended, each cancellable after a confirming second click. */
@Component({
  selector: 'cw-my-bookings',
  imports: [MatButton],
  templateUrl: './my-bookings.html',
  styleUrl: './my-bookings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MyBookings {
  readonly bookings = input.required<Booking[]>();
  readonly bookingCancelled = output<number>();

  /** The booking whose cancellation waits for confirmation. */
  protected readonly confirming = signal<number | null>(null);

  protected when(local: string): string {
    return local.replace('T', ' ');
  }

  protected confirmCancel(bookingId: number): void {
    this.confirming.set(null);
    this.bookingCancelled.emit(bookingId);
  }
}
