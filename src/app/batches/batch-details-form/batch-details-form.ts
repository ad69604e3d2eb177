import { ChangeDetectionStrategy, Component, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { Batch, BrewerChoice, FermenterChoice, UpdateBatchRequest } from '@shared/batches';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';
import { batchFieldControls } from '../batch-fields/batch-field-controls';
import { BatchFields } from '../batch-fields/batch-fields';

/** The batch's details as its editors change them: name, brewer, brew day, planned volume, fermenter, notes. Only changed fields are sent. */
@Component({
  selector: 'cw-batch-details-form',
  imports: [ReactiveFormsModule, BatchFields, MatFormField, MatLabel, MatHint, MatSelect, MatOption, MatButton],
  templateUrl: './batch-details-form.html',
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

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({ ...batchFieldControls(this.fb, null), brewerId: this.fb.control(0) });

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
