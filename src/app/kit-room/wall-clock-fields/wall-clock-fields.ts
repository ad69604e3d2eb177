import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DateTime } from 'luxon';

/**
 * One end of a booking as the co-op's wall clock: a day from the Material date picker (luxon) and a
 * typed time. The controls belong to the parent's form, which marks them touched and sets server errors.
 */
@Component({
  selector: 'cw-wall-clock-fields',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatDatepicker, MatDatepickerInput, MatDatepickerToggle],
  templateUrl: './wall-clock-fields.html',
  styleUrl: './wall-clock-fields.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WallClockFields {
  /** "Start" or "End": the fields are labelled "Start date", "Start time". */
  readonly label = input.required<string>();
  readonly date = input.required<FormControl<DateTime | null>>();
  readonly time = input.required<FormControl<string>>();
  /** The earliest day the picker offers. */
  readonly min = input<DateTime | null>(null);
  /** Said when no valid day is picked. */
  readonly missingDate = input('Pick a day (yyyy-MM-dd).');
}
