import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';
import { BATCH_LIMITS, BrewerChoice } from '@shared/batches';
import { BREW_PLAN_LIMITS, ProposalRequest } from '@shared/brew-plan';
import { RecipeSummary } from '@shared/recipes';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { onCountChange } from '@app/ui/on-count-change';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** What the brewer asks the planner for, with the name the batch will carry and (admins) whose batch it is. */
export interface PlanRequest {
  name: string;
  /** Null: the person planning. */
  brewerId: number | null;
  request: ProposalRequest;
}

const optionalDays = (range: { min: number; max: number }) => [Validators.min(range.min), Validators.max(range.max)];

/** Recipe version, volume, wanted week and optionally the brewer's own fermentation and conditioning days. */
@Component({
  selector: 'cw-plan-batch-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatButton],
  templateUrl: './plan-batch-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanBatchForm {
  readonly recipes = input.required<RecipeSummary[]>();
  /** Admins choose whose batch it is from these active brewers; null hides the choice (a brewer plans for themself). */
  readonly brewers = input<readonly BrewerChoice[] | null>(null);
  /** Today in the co-op's zone; earlier weeks cannot be picked. */
  readonly today = input.required<DateTime>();
  readonly pending = input(false);
  readonly fieldErrors = input<FieldErrors | null>(null);
  /** Goes up by one per accepted slot; the form then clears. */
  readonly acceptedCount = input(0);
  readonly proposalsRequested = output<PlanRequest>();
  /** Any edit, valid or not: proposals shown for the earlier values are stale. */
  readonly changed = output<void>();

  protected readonly limits = { volume: BATCH_LIMITS.volumeLitres, fermentation: BREW_PLAN_LIMITS.fermentationDays, conditioning: BREW_PLAN_LIMITS.conditioningDays, nameMax: BATCH_LIMITS.nameMaxLength };
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    name: ['', [Validators.required, Validators.maxLength(BATCH_LIMITS.nameMaxLength)]],
    brewerId: this.fb.control<number | null>(null),
    recipeId: this.fb.control<number | null>(null, Validators.required),
    recipeVersion: this.fb.control<number | null>(null, Validators.required),
    volumeLitres: this.fb.control<number | null>(20, [Validators.required, Validators.min(BATCH_LIMITS.volumeLitres.min), Validators.max(BATCH_LIMITS.volumeLitres.max)]),
    wantedWeek: this.fb.control<DateTime | null>(null, Validators.required),
    fermentationDays: this.fb.control<number | null>(null, optionalDays(BREW_PLAN_LIMITS.fermentationDays)),
    conditioningDays: this.fb.control<number | null>(null, optionalDays(BREW_PLAN_LIMITS.conditioningDays)),
  });
  private readonly recipeId = toSignal(this.form.controls.recipeId.valueChanges, { initialValue: null });
  protected readonly versions = computed(() => {
    const recipe = this.recipes().find((r) => r.id === this.recipeId());
    return recipe ? Array.from({ length: recipe.version }, (_, i) => recipe.version - i) : [];
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
    effect(() => this.form.controls.recipeVersion.setValue(this.versions()[0] ?? null));
    this.form.valueChanges.pipe(takeUntilDestroyed()).subscribe(() => this.changed.emit());
    onCountChange(this.acceptedCount, () => {
      this.form.patchValue({ name: '', fermentationDays: null, conditioningDays: null });
      this.form.markAsUntouched();
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form, this.pending())) return;
    const v = this.form.getRawValue();
    const request: ProposalRequest = { recipeId: v.recipeId!, recipeVersion: v.recipeVersion!, volumeLitres: v.volumeLitres!, wantedWeek: v.wantedWeek!.toISODate()! };
    if (v.fermentationDays !== null) request.fermentationDays = v.fermentationDays;
    if (v.conditioningDays !== null) request.conditioningDays = v.conditioningDays;
    this.proposalsRequested.emit({ name: v.name.trim(), brewerId: this.brewers() === null ? null : v.brewerId, request });
  }
}
