import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, untracked } from '@angular/core';
import { AbstractControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { NAME_MAX_LENGTH, STYLE_TARGET_KEYS, STYLE_TARGET_LIMITS, StyleTarget, StyleTargetInput, StyleTargetKey } from '@shared/recipes';

// The bounds are the shared limits the server checks too.
const BOUNDS: Record<StyleTargetKey, { label: string; min: number; max: number; step: number }> = {
  og: { label: 'OG', ...STYLE_TARGET_LIMITS.og, step: 0.001 },
  fg: { label: 'FG', ...STYLE_TARGET_LIMITS.fg, step: 0.001 },
  abv: { label: 'ABV (% vol)', ...STYLE_TARGET_LIMITS.abv, step: 0.1 },
  ibu: { label: 'IBU', ...STYLE_TARGET_LIMITS.ibu, step: 1 },
  colourSrm: { label: 'Colour (SRM)', ...STYLE_TARGET_LIMITS.colourSrm, step: 0.5 },
};

function orderedRange(group: AbstractControl): ValidationErrors | null {
  const { min, max } = group.value as { min: number | null; max: number | null };
  return min !== null && max !== null && min > max ? { order: true } : null;
}

/** Adds or changes a style of the co-op's list: a name and five ranges. */
@Component({
  selector: 'cw-style-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatButton],
  templateUrl: './style-form.html',
  styleUrl: '../../catalogue/catalogue-entry-form/catalogue-entry-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StyleForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly style = input<StyleTarget | null>(null);
  readonly saving = input(false);
  readonly savedCount = input(0);
  readonly submitted = output<StyleTargetInput>();
  readonly cancelled = output<void>();

  protected readonly targets = STYLE_TARGET_KEYS.map((key) => ({ key, ...BOUNDS[key] }));
  protected readonly form = this.fb.group({
    name: this.fb.control('', [Validators.required, Validators.maxLength(NAME_MAX_LENGTH)]),
    og: this.range('og'),
    fg: this.range('fg'),
    abv: this.range('abv'),
    ibu: this.range('ibu'),
    colourSrm: this.range('colourSrm'),
  });
  protected readonly title = computed(() => (this.style() ? `Change ${this.style()!.name}` : 'Add a style'));

  constructor() {
    effect(() => {
      this.savedCount();
      const style = this.style();
      untracked(() => {
        this.form.reset();
        if (style) this.form.patchValue(style);
      });
    });
  }

  protected submit(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const ranges = Object.fromEntries(STYLE_TARGET_KEYS.map((key) => [key, { min: value[key].min ?? 0, max: value[key].max ?? 0 }]));
    this.submitted.emit({ name: value.name.trim(), ...ranges } as StyleTargetInput);
  }

  private range(key: StyleTargetKey) {
    const { min, max } = BOUNDS[key];
    const limits = [Validators.required, Validators.min(min), Validators.max(max)];
    return this.fb.group({ min: this.fb.control<number | null>(null, limits), max: this.fb.control<number | null>(null, limits) }, { validators: orderedRange });
  }
}
