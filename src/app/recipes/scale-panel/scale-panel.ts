import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import {
  BrewhouseSettings,
  fromDisplayUnits,
  IngredientCatalogue,
  predictRecipe,
  RECIPE_LIMITS,
  RecipeDesign,
  scaleRecipe,
  unitLabel,
  UnitSystem,
} from '@shared/recipes';
import { limitIn, minimumIn, SI_LIMITS } from '../recipe-form/recipe-form-groups';
import { shownAmount } from '../view-models/recipe-form-model';

/** Scales the design to another batch volume or efficiency, keeping OG and IBU; shows before and after. */
@Component({
  selector: 'cw-scale-panel',
  imports: [ReactiveFormsModule, DecimalPipe, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatButton],
  templateUrl: './scale-panel.html',
  styleUrl: './scale-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScalePanel {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly design = input.required<RecipeDesign>();
  readonly catalogue = input.required<IngredientCatalogue>();
  readonly brewhouse = input.required<BrewhouseSettings>();
  readonly unitSystem = input<UnitSystem>('metric');
  readonly scaled = output<RecipeDesign>();
  readonly closed = output<void>();

  protected readonly form = this.fb.group({
    volume: this.fb.control<number | null>(null, [Validators.required]),
    efficiency: this.fb.control<number | null>(null, [
      Validators.required,
      Validators.min(RECIPE_LIMITS.mashEfficiencyPercent.min),
      Validators.max(RECIPE_LIMITS.mashEfficiencyPercent.max),
    ]),
  });
  private readonly formValue = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  protected readonly volumeUnit = computed(() => unitLabel('volume', this.unitSystem()));
  protected readonly maxVolume = computed(() => limitIn('volume', SI_LIMITS.batchVolumeLitres, this.unitSystem()));

  /** The scaled design and the predictions before and after, or null while the targets are invalid. */
  protected readonly preview = computed(() => {
    const { volume, efficiency } = this.formValue();
    const design = this.design();
    if (volume == null || efficiency == null || volume < 0.5 || volume > this.maxVolume() || efficiency < 20 || efficiency > 100) return null;
    const target = { batchVolumeLitres: fromDisplayUnits('volume', volume, this.unitSystem()), mashEfficiencyPercent: efficiency };
    const result = scaleRecipe(design, target, this.catalogue(), this.brewhouse());
    return {
      design: result,
      before: predictRecipe(design, this.catalogue(), this.brewhouse()),
      after: predictRecipe(result, this.catalogue(), this.brewhouse()),
    };
  });

  constructor() {
    effect(() => {
      const design = this.design();
      const system = this.unitSystem();
      untracked(() => {
        this.form.controls.volume.setValidators([
          Validators.required,
          Validators.min(minimumIn('volume', RECIPE_LIMITS.batchVolumeLitres.min, system)),
          Validators.max(limitIn('volume', SI_LIMITS.batchVolumeLitres, system)),
        ]);
        this.form.setValue({ volume: shownAmount('volume', design.batchVolumeLitres, system), efficiency: design.mashEfficiencyPercent });
      });
    });
  }

  protected apply(): void {
    const preview = this.preview();
    if (this.form.invalid || !preview) {
      this.form.markAllAsTouched();
      return;
    }
    this.scaled.emit(preview.design);
  }
}
