import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { BATCH_LIMITS, CreateBatchRequest, FermenterChoice } from '@shared/batches';
import { RecipeSummary, RecipeVersionSummary } from '@shared/recipes';
import { applyServerFieldErrors } from '@app/ui/server-field-errors';
import { KeyValuePipe } from '@angular/common';

/** Starts a batch: from a recipe version or none, with brew day, planned volume and fermenter. */
@Component({
  selector: 'cw-batch-start-form',
  imports: [KeyValuePipe, ReactiveFormsModule, MatFormField, MatLabel, MatInput, MatError, MatHint, MatSuffix, MatSelect, MatOption, MatButton, MatDatepicker, MatDatepickerInput, MatDatepickerToggle],
  templateUrl: './batch-start-form.html',
  styleUrl: './batch-start-form.scss',
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

  protected readonly limits = BATCH_LIMITS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    recipeId: [null as number | null],
    recipeVersion: [null as number | null],
    name: ['', [Validators.required, Validators.maxLength(BATCH_LIMITS.nameMaxLength)]],
    brewDate: [DateTime.now() as DateTime | null, Validators.required],
    plannedVolumeLitres: [20, [Validators.required, Validators.min(BATCH_LIMITS.volumeLitres.min), Validators.max(BATCH_LIMITS.volumeLitres.max)]],
    fermenterId: [null as number | null],
    notes: ['', Validators.maxLength(BATCH_LIMITS.notesMaxLength)],
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
