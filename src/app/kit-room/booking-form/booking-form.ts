import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { BOOKING_LIMITS, CreateBookingRequest } from '@shared/bookings';
import { KitItemSummary } from '@shared/kit';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { NamedChoice } from '../named-choice';
import { WallClockFields } from '../wall-clock-fields/wall-clock-fields';
import { endAfterStart, wallClockOf } from './booking-form-model';
import { onCountChange } from '@app/ui/on-count-change';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** Item, start and end (wall-clock, co-op zone) and a note; admins may block the item for maintenance instead. */
@Component({
  selector: 'cw-booking-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatInput, MatSelect, MatOption, MatCheckbox, MatButton, WallClockFields],
  templateUrl: './booking-form.html',
  styleUrl: './booking-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BookingForm {
  readonly items = input.required<KitItemSummary[]>();
  readonly timeZone = input.required<string>();
  /** Today in the co-op's zone; earlier days cannot be picked. */
  readonly today = input.required<DateTime>();
  readonly isAdmin = input(false);
  /** My batches still under way; a booking may serve one. */
  readonly batches = input<NamedChoice[]>([]);
  /** Admins only: the people they may book for. */
  readonly people = input<NamedChoice[]>([]);
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly fieldErrors = input<FieldErrors | null>(null);
  /** Goes up by one per booking made; the form then clears its times. */
  readonly createdCount = input(0);
  readonly bookingSubmitted = output<CreateBookingRequest>();

  protected readonly noteMaxLength = BOOKING_LIMITS.noteMaxLength;
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group(
    {
      kitItemId: this.fb.control<number | null>(null, Validators.required),
      startDate: this.fb.control<DateTime | null>(null, Validators.required),
      startTime: ['10:00', Validators.required],
      endDate: this.fb.control<DateTime | null>(null, Validators.required),
      endTime: ['10:00', Validators.required],
      note: ['', Validators.maxLength(BOOKING_LIMITS.noteMaxLength)],
      maintenance: [false],
      batchId: this.fb.control<number | null>(null),
      userId: this.fb.control<number | null>(null),
    },
    { validators: endAfterStart },
  );

  constructor() {
    // The API names the instants; the form has a date picker and a time field for each.
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors(), { start: 'startDate', end: 'endDate' }));
    onCountChange(this.createdCount, () => {
      this.form.patchValue({ startDate: null, endDate: null, note: '', maintenance: false, batchId: null });
      this.form.markAsUntouched();
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form, this.pending())) return;
    const value = this.form.getRawValue();
    this.bookingSubmitted.emit({
      kitItemId: value.kitItemId!,
      start: wallClockOf(value.startDate, value.startTime)!,
      end: wallClockOf(value.endDate, value.endTime)!,
      note: value.note.trim() || undefined,
      ...(value.maintenance ? { purpose: 'maintenance' as const } : {}),
      ...(value.batchId !== null && !value.maintenance && value.userId === null ? { batchId: value.batchId } : {}),
      ...(value.userId !== null && !value.maintenance ? { userId: value.userId } : {}),
    });
  }
}
