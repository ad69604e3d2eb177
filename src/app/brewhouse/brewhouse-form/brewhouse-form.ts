import { ChangeDetectionStrategy, Component, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { BREWHOUSE_LIMITS, BrewhouseSettings, KETTLE_CAPACITY_MAX_LITRES } from '@shared/recipes';

type NumericKey = Exclude<keyof BrewhouseSettings, 'mashTunHeatCapacityKjPerK' | 'kettleCapacityLitres'>;

/** The fields of the brewhouse settings, with the shared limits the server checks too. */
const FIELDS: { key: NumericKey; label: string; unit: string; min: number; max: number }[] = [
  { key: 'boilOffLitresPerHour', label: 'Boil-off', ...BREWHOUSE_LIMITS.boilOffLitresPerHour },
  { key: 'grainAbsorptionLitresPerKg', label: 'Grain absorption', ...BREWHOUSE_LIMITS.grainAbsorptionLitresPerKg },
  { key: 'kettleLossLitres', label: 'Kettle loss', ...BREWHOUSE_LIMITS.kettleLossLitres },
  { key: 'fermenterLossLitres', label: 'Fermenter loss', ...BREWHOUSE_LIMITS.fermenterLossLitres },
  { key: 'mashThicknessLitresPerKg', label: 'Mash thickness', ...BREWHOUSE_LIMITS.mashThicknessLitresPerKg },
  { key: 'grainTemperatureC', label: 'Grain temperature', ...BREWHOUSE_LIMITS.grainTemperatureC },
];
const HEAT_CAPACITY = BREWHOUSE_LIMITS.mashTunHeatCapacityKjPerK;

/** The co-op's brewhouse settings, from which every recipe's water plan follows (metric, as stored). */
@Component({
  selector: 'cw-brewhouse-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatButton],
  templateUrl: './brewhouse-form.html',
  styleUrl: '../../catalogue/catalogue-entry-form/catalogue-entry-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BrewhouseForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly settings = input.required<BrewhouseSettings>();
  readonly canEdit = input(false);
  readonly saving = input(false);
  readonly submitted = output<BrewhouseSettings>();

  protected readonly fields = FIELDS;
  protected readonly form = this.fb.group({
    ...(Object.fromEntries(
      FIELDS.map((f) => [f.key, this.fb.control<number | null>(null, [Validators.required, Validators.min(f.min), Validators.max(f.max)])]),
    ) as Record<NumericKey, ReturnType<typeof this.fb.control<number | null>>>),
    mashTunHeatCapacityKjPerK: this.fb.control<number | null>(null, [Validators.min(HEAT_CAPACITY.min), Validators.max(HEAT_CAPACITY.max)]),
    kettleCapacityLitres: this.fb.control<number | null>(null, [Validators.min(0.1), Validators.max(KETTLE_CAPACITY_MAX_LITRES)]),
  });
  protected readonly maxKettle = KETTLE_CAPACITY_MAX_LITRES;

  constructor() {
    effect(() => {
      const settings = this.settings();
      const canEdit = this.canEdit();
      untracked(() => {
        this.form.reset(settings);
        if (canEdit) this.form.enable();
        else this.form.disable();
      });
    });
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.submitted.emit(this.form.getRawValue() as BrewhouseSettings);
  }
}
