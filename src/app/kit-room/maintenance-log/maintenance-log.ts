import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DateTime } from 'luxon';
import { KIT_LIMITS, MaintenanceEntry, MaintenanceEntryInput } from '@shared/kit';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** An item's maintenance log, newest first, with the form for a new entry. */
@Component({
  selector: 'cw-maintenance-log',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatButton],
  templateUrl: './maintenance-log.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MaintenanceLog {
  readonly entries = input.required<MaintenanceEntry[]>();
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly recordedCount = input(0);
  readonly entrySubmitted = output<MaintenanceEntryInput>();

  protected readonly limits = KIT_LIMITS;
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    performedOn: this.fb.control<DateTime | null>(null, Validators.required),
    work: ['', [Validators.required, Validators.maxLength(KIT_LIMITS.maintenanceWorkMaxLength)]],
    performedBy: ['', [Validators.required, Validators.maxLength(KIT_LIMITS.maintenanceByMaxLength)]],
    nextDueOn: this.fb.control<DateTime | null>(null),
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
    effect(() => {
      this.recordedCount();
      this.form.reset();
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form)) return;
    const value = this.form.getRawValue();
    this.entrySubmitted.emit({
      performedOn: value.performedOn!.toFormat('yyyy-MM-dd'),
      work: value.work.trim(),
      performedBy: value.performedBy.trim(),
      nextDueOn: value.nextDueOn ? value.nextDueOn.toFormat('yyyy-MM-dd') : null,
    });
  }
}
