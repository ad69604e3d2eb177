import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { DateTime } from 'luxon';
import { Booking, MoveBookingRequest } from '@shared/bookings';
import { endAfterStart, wallClockOf, wallClockParts } from '../booking-form/booking-form-model';
import { WallClockFields } from '../wall-clock-fields/wall-clock-fields';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** An admin's view of one booking from the calendar: move it to other times, or cancel it after confirming. */
@Component({
  selector: 'cw-booking-admin-panel',
  imports: [ReactiveFormsModule, MatButton, WallClockFields],
  templateUrl: './booking-admin-panel.html',
  styleUrl: './booking-admin-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookingAdminPanel {
  readonly booking = input.required<Booking>();
  /** Today in the co-op's zone; a booking cannot move to an earlier day. */
  readonly today = input.required<DateTime>();
  readonly moveSubmitted = output<{ bookingId: number; request: MoveBookingRequest }>();
  readonly bookingCancelled = output<number>();
  readonly closed = output<void>();

  protected readonly confirmingCancel = signal(false);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group(
    {
      startDate: this.fb.control<DateTime | null>(null, Validators.required),
      startTime: ['', Validators.required],
      endDate: this.fb.control<DateTime | null>(null, Validators.required),
      endTime: ['', Validators.required],
    },
    { validators: endAfterStart },
  );

  constructor() {
    effect(() => {
      const booking = this.booking();
      const start = wallClockParts(booking.startLocal);
      const end = wallClockParts(booking.endLocal);
      this.form.reset({ startDate: start.date, startTime: start.time, endDate: end.date, endTime: end.time });
      this.confirmingCancel.set(false);
    });
  }

  protected move(): void {
    if (!readyToSubmit(this.form)) return;
    const value = this.form.getRawValue();
    const request = { start: wallClockOf(value.startDate, value.startTime)!, end: wallClockOf(value.endDate, value.endTime)! };
    this.moveSubmitted.emit({ bookingId: this.booking().id, request });
  }

  protected cancel(): void {
    this.confirmingCancel.set(false);
    this.bookingCancelled.emit(this.booking().id);
  }
}
