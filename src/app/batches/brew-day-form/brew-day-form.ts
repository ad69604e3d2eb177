import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatTimepicker, MatTimepickerInput, MatTimepickerToggle } from '@angular/material/timepicker';
import { DateTime } from 'luxon';
import { BATCH_LIMITS, BatchPrediction, BrewDayMeasurements } from '@shared/batches';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';
import { coopInstant, coopPickerValues } from '../coop-date-time';

const L = BATCH_LIMITS;
const range = (r: { min: number; max: number }) => [Validators.min(r.min), Validators.max(r.max)];

/** What was measured on the brew day, each figure beside what the recipe version predicted. */
@Component({
  selector: 'cw-brew-day-form',
  imports: [DecimalPipe, ReactiveFormsModule, MatFormField, MatLabel, MatInput, MatError, MatSuffix, MatButton, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatTimepicker, MatTimepickerInput, MatTimepickerToggle],
  templateUrl: './brew-day-form.html',
  styleUrl: './brew-day-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BrewDayForm {
  readonly measured = input.required<BrewDayMeasurements>();
  readonly predicted = input<BatchPrediction | null>(null);
  /** The batch's own planned volume, which may differ from the volume its recipe version was designed for. */
  readonly plannedLitres = input<number | null>(null);
  readonly editable = input(false);
  readonly saving = input(false);
  readonly coopTimeZone = input.required<string>();
  readonly serverErrors = input<Record<string, string> | null>(null);
  readonly saved = output<BrewDayMeasurements>();

  protected readonly limits = L;
  protected readonly planned = computed(() => this.plannedLitres() ?? this.predicted()?.batchVolumeLitres ?? null);
  /** The version's pre-boil figures hold for its own volume; said so when the batch is planned at another. */
  protected readonly recipeVolumeNote = computed(() => {
    const p = this.predicted();
    const planned = this.plannedLitres();
    if (!p || planned === null || Math.abs(planned - p.batchVolumeLitres) < 0.05) return '';
    return ` for the recipe's ${p.batchVolumeLitres.toFixed(1)} L`;
  });
  protected readonly form = inject(NonNullableFormBuilder).group({
    preBoilLitres: [null as number | null, range(L.volumeLitres)],
    preBoilGravity: [null as number | null, range(L.gravity)],
    fermenterLitres: [null as number | null, range(L.volumeLitres)],
    originalGravity: [null as number | null, range(L.gravity)],
    originalGravityTemperatureC: [null as number | null, range(L.temperatureC)],
    pitchDate: [null as DateTime | null],
    pitchTime: [null as DateTime | null],
  });

  constructor() {
    effect(() => {
      const m = this.measured();
      const pitch = m.pitchedAt ? coopPickerValues(m.pitchedAt, this.coopTimeZone()) : null;
      this.form.reset({ ...m, pitchDate: pitch?.date ?? null, pitchTime: pitch?.time ?? null });
      if (!this.editable()) this.form.disable();
      else this.form.enable();
    });
    effect(() => applyServerFieldErrors(this.form, this.serverErrors()));
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { pitchDate, pitchTime, ...figures } = this.form.getRawValue();
    const pitchedAt = pitchDate && pitchTime ? coopInstant(pitchDate, pitchTime, this.coopTimeZone()) : null;
    this.saved.emit({ ...figures, pitchedAt });
  }
}
