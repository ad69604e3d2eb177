import { ChangeDetectionStrategy, Component, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { ErrorStateMatcher } from '@angular/material/core';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { MatTimepicker, MatTimepickerInput, MatTimepickerToggle } from '@angular/material/timepicker';
import { DateTime } from 'luxon';
import { GravityUnit, Instrument, INSTRUMENT_LABELS, INSTRUMENT_UNITS, INSTRUMENTS, READING_LIMITS, ReadingInput, UNIT_LABELS } from '@shared/readings';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';
import { coopInstant, coopNowPickerValues } from '@app/batches/coop-date-time';
import { rawValueInRange } from './raw-value-validator';

const L = READING_LIMITS;

/** One reading: when (co-op time), instrument, raw value and unit, sample and calibration temperature. */
@Component({
  selector: 'cw-reading-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatInput, MatError, MatHint, MatSuffix, MatSelect, MatOption, MatButton, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatTimepicker, MatTimepickerInput, MatTimepickerToggle],
  templateUrl: './reading-form.html',
  styleUrl: './reading-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingForm {
  readonly coopTimeZone = input.required<string>();
  readonly saving = input(false);
  readonly savedRevision = input(0);
  readonly serverErrors = input<Record<string, string> | null>(null);
  readonly submitted = output<ReadingInput>();

  protected readonly instruments = INSTRUMENTS;
  protected readonly instrumentLabels = INSTRUMENT_LABELS;
  protected readonly unitLabels = UNIT_LABELS;
  protected readonly limits = L;
  private readonly fb = inject(NonNullableFormBuilder);
  /** Errors show once a field was left or the form refused, not merely because an earlier reading was sent. */
  protected readonly touchedOnly: ErrorStateMatcher = { isErrorState: (control) => !!control && control.invalid && control.touched };
  private readonly unit = this.fb.control<GravityUnit>('sg');
  protected readonly form = this.fb.group({
    date: [null as DateTime | null, Validators.required],
    time: [null as DateTime | null, Validators.required],
    instrument: ['hydrometer' as Instrument],
    rawUnit: this.unit,
    rawValue: [null as number | null, [Validators.required, rawValueInRange(() => this.unit.value)]],
    sampleTemperatureC: [20 as number | null, [Validators.min(L.sampleTemperatureC.min), Validators.max(L.sampleTemperatureC.max)]],
    calibrationTemperatureC: [20 as number | null, [Validators.min(L.calibrationTemperatureC.min), Validators.max(L.calibrationTemperatureC.max)]],
    note: ['', Validators.maxLength(L.noteMaxLength)],
  });

  constructor() {
    // After each stored reading the value clears and the clock moves on; instrument and temperatures stay.
    effect(() => {
      this.savedRevision();
      const now = coopNowPickerValues(this.coopTimeZone());
      untracked(() => {
        this.form.patchValue({ date: now.date, time: now.time, rawValue: null, note: '' });
        this.form.controls.rawValue.markAsUntouched();
      });
    });
    effect(() => applyServerFieldErrors(this.form, this.serverErrors()));
  }

  protected unitsOf(instrument: Instrument): readonly GravityUnit[] {
    return INSTRUMENT_UNITS[instrument];
  }

  protected chooseInstrument(instrument: Instrument): void {
    this.form.controls.rawUnit.setValue(INSTRUMENT_UNITS[instrument][0]);
    this.form.controls.rawValue.updateValueAndValidity();
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const measuredAt = coopInstant(v.date!, v.time!, this.coopTimeZone());
    if (!measuredAt) return;
    this.submitted.emit({
      measuredAt,
      instrument: v.instrument,
      rawValue: v.rawValue!,
      rawUnit: v.rawUnit,
      sampleTemperatureC: v.sampleTemperatureC,
      calibrationTemperatureC: v.instrument === 'hydrometer' ? v.calibrationTemperatureC : null,
      note: v.note,
    });
  }
}
