import { ChangeDetectionStrategy, Component, computed, inject, input, output } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import { MatTimepicker, MatTimepickerInput, MatTimepickerToggle } from '@angular/material/timepicker';
import { DateTime } from 'luxon';
import { BATCH_STATUS_LABELS, BATCH_STATUSES, BatchStatus, BatchStatusDates, nextStatus } from '@shared/batches';
import { coopInstant, coopNowPickerValues } from '../coop-date-time';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** A move the person chose: to which status, and when it happened (ISO instant) or null for now. */
export interface ChosenMove {
  status: BatchStatus;
  at: string | null;
}

/** The status flow with the date each status was reached; moves forward one step, or further after asking, now or back-dated. */
@Component({
  selector: 'cw-status-flow',
  imports: [
    ReactiveFormsModule, MatButton, MatCheckbox, MatMenu, MatMenuItem, MatMenuTrigger, MatFormField, MatLabel, MatHint, MatError, MatSuffix, MatInput,
    MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatTimepicker, MatTimepickerInput, MatTimepickerToggle, ZonedDateTimePipe,
  ],
  templateUrl: './status-flow.html',
  styleUrl: './status-flow.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatusFlow {
  readonly status = input.required<BatchStatus>();
  readonly dates = input.required<BatchStatusDates>();
  readonly editable = input(false);
  readonly busy = input(false);
  readonly coopTimeZone = input.required<string>();
  readonly moveChosen = output<ChosenMove>();

  protected readonly labels = BATCH_STATUS_LABELS;
  protected readonly when = inject(NonNullableFormBuilder).group({
    earlier: [false],
    date: [null as DateTime | null, Validators.required],
    time: [null as DateTime | null, Validators.required],
  });
  protected readonly steps = computed(() => {
    const reached = BATCH_STATUSES.indexOf(this.status());
    return BATCH_STATUSES.map((status, i) => ({ status, date: this.dates()[status], current: i === reached, past: i < reached }));
  });
  protected readonly next = computed(() => nextStatus(this.status()));
  /** Later statuses past the next one: reaching them skips steps. */
  protected readonly further = computed(() => BATCH_STATUSES.slice(BATCH_STATUSES.indexOf(this.status()) + 2));

  constructor() {
    // The pickers start at now on the co-op's clocks when the person says the move happened earlier.
    this.when.controls.earlier.valueChanges.pipe(takeUntilDestroyed()).subscribe((earlier) => {
      if (earlier) this.when.patchValue(coopNowPickerValues(this.coopTimeZone()));
    });
  }

  protected choose(status: BatchStatus): void {
    const { earlier, date, time } = this.when.getRawValue();
    const at = earlier && date && time ? coopInstant(date, time, this.coopTimeZone()) : null;
    this.moveChosen.emit({ status, at });
  }
}
