import { ChangeDetectionStrategy, Component, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { Batch, BATCH_LIMITS, BrewerChoice, FermenterChoice, UpdateBatchRequest } from '@shared/batches';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';

/** The batch's details as its editors change them: name, brewer, brew day, planned volume, fermenter, notes. Only changed fields are sent. */
@Component({
  selector: 'cw-batch-details-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatInput, MatError, MatHint, MatSuffix, MatSelect, MatOption, MatButton, MatDatepicker, MatDatepickerInput, MatDatepickerToggle],
  templateUrl: './batch-details-form.html',
  styles: `.row { display: flex; flex-wrap: wrap; gap: 0 12px; } .row mat-form-field { flex: 1 1 180px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchDetailsForm {
  readonly batch = input.required<Batch>();
  readonly brewers = input.required<readonly BrewerChoice[]>();
  readonly fermenters = input.required<readonly FermenterChoice[]>();
  readonly coopTimeZone = input.required<string>();
  readonly saving = input(false);
  readonly serverErrors = input<Record<string, string> | null>(null);
  readonly saved = output<UpdateBatchRequest>();
  readonly cancelled = output<void>();

  protected readonly limits = BATCH_LIMITS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(BATCH_LIMITS.nameMaxLength)]],
    brewerId: [0],
    brewDate: [null as DateTime | null, Validators.required],
    plannedVolumeLitres: [20, [Validators.required, Validators.min(BATCH_LIMITS.volumeLitres.min), Validators.max(BATCH_LIMITS.volumeLitres.max)]],
    fermenterId: [null as number | null],
    notes: ['', Validators.maxLength(BATCH_LIMITS.notesMaxLength)],
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.serverErrors()));
    effect(() => {
      const b = this.batch();
      untracked(() => this.form.reset({
        name: b.name, brewerId: b.brewerId, brewDate: DateTime.fromISO(b.brewDate), plannedVolumeLitres: b.plannedVolumeLitres, fermenterId: b.fermenterId, notes: b.notes,
      }));
    });
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const b = this.batch();
    const next: UpdateBatchRequest = {
      name: v.name.trim(), brewerId: v.brewerId, brewDate: v.brewDate!.toISODate()!, plannedVolumeLitres: v.plannedVolumeLitres, fermenterId: v.fermenterId, notes: v.notes,
    };
    const before: UpdateBatchRequest = { name: b.name, brewerId: b.brewerId, brewDate: b.brewDate, plannedVolumeLitres: b.plannedVolumeLitres, fermenterId: b.fermenterId, notes: b.notes };
    const changes = Object.fromEntries(Object.entries(next).filter(([key, value]) => before[key as keyof UpdateBatchRequest] !== value)) as UpdateBatchRequest;
    this.saved.emit(changes);
  }
}
