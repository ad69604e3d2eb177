import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { Booking, MoveBookingRequest, WALL_CLOCK_PATTERN } from '@shared/bookings';

/** An admin's view of one booking from the calendar: move it to other times, or cancel it after confirming. */
@Component({
  selector: 'cw-booking-admin-panel',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatButton],
  templateUrl: './booking-admin-panel.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookingAdminPanel {
  readonly booking = input.required<Booking>();
  readonly moveSubmitted = output<{ bookingId: number; request: MoveBookingRequest }>();
  readonly bookingCancelled = output<number>();
  readonly closed = output<void>();

  protected readonly confirmingCancel = signal(false);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    start: ['', [Validators.required, Validators.pattern(WALL_CLOCK_PATTERN)]],
    end: ['', [Validators.required, Validators.pattern(WALL_CLOCK_PATTERN)]],
  });

  constructor() {
    effect(() => {
      const booking = this.booking();
      this.form.reset({ start: booking.startLocal, end: booking.endLocal });
      this.confirmingCancel.set(false);
    });
  }

  protected move(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.moveSubmitted.emit({ bookingId: this.booking().id, request: this.form.getRawValue() });
  }

  protected cancel(): void {
    this.confirmingCancel.set(false);
    this.bookingCancelled.emit(this.booking().id);
  }
}
