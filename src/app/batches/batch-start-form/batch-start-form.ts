import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { KeyValuePipe } from '@angular/common';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { CreateBatchRequest, FermenterChoice } from '@shared/batches';
import { RecipeSummary, RecipeVersionSummary } from '@shared/recipes';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';
import { batchFieldControls } from '../batch-fields/batch-field-controls';
import { BatchFields } from '../batch-fields/batch-fields';

/** Starts a batch: from a recipe version or none, with brew day, planned volume and fermenter. */
@Component({
  selector: 'cw-batch-start-form',
  imports: [KeyValuePipe, ReactiveFormsModule, BatchFields, MatFormField, MatLabel, MatHint, MatSelect, MatOption, MatButton],
  templateUrl: './batch-start-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchStartForm {
  readonly recipes = input.required<readonly RecipeSummary[]>();
  readonly versions = input.required<readonly RecipeVersionSummary[]>();
  readonly fermenters = input.required<readonly FermenterChoice[]>();
  readonly brewerName = input.required<string>();
  readonly coopTimeZone = input.required<string>();
  readonly saving = input(false);
  readonly serverErrors = input<Record<string, string> | null>(null);
  readonly recipeChosen = output<number>();
  readonly started = output<CreateBatchRequest>();

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    recipeId: this.fb.control<number | null>(null),
    recipeVersion: this.fb.control<number | null>(null),
    ...batchFieldControls(this.fb, DateTime.now()),
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.serverErrors()));
    // The newest version is proposed as soon as the versions of the chosen recipe arrive.
    effect(() => {
      const newest = this.versions()[0]?.version ?? null;
      if (this.form.controls.recipeId.value !== null) this.form.controls.recipeVersion.setValue(newest);
    });
  }

  protected chooseRecipe(recipeId: number | null): void {
    this.form.controls.recipeVersion.setValue(null);
    if (recipeId === null) return;
    const recipe = this.recipes().find((r) => r.id === recipeId);
    if (recipe) this.form.patchValue({ name: this.form.controls.name.value || recipe.name, plannedVolumeLitres: recipe.batchVolumeLitres });
    this.recipeChosen.emit(recipeId);
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    this.started.emit({
      name: v.name.trim(),
      recipeId: v.recipeId,
      recipeVersion: v.recipeId === null ? null : v.recipeVersion,
      brewDate: v.brewDate!.toISODate()!,
      plannedVolumeLitres: v.plannedVolumeLitres,
      fermenterId: v.fermenterId,
      notes: v.notes,
    });
  }
}
