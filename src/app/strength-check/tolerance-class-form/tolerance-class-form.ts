import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, untracked } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { TOLERANCE_CLASS_LIMITS as L, ToleranceClass, ToleranceClassInput } from '@shared/strength-check';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** Adds or changes a product class and the tolerance a declared strength of it is held to. */
@Component({
  selector: 'cw-tolerance-class-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatButton, MatCheckbox],
  templateUrl: './tolerance-class-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ToleranceClassForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly toleranceClass = input<ToleranceClass | null>(null);
  readonly saving = input(false);
  readonly savedCount = input(0);
  readonly submitted = output<ToleranceClassInput>();
  readonly cancelled = output<void>();

  protected readonly limits = L;
  protected readonly form = this.fb.group({
    name: this.fb.control('', [Validators.required, Validators.maxLength(L.nameMax)]),
    tolerancePercentVolume: this.fb.control<number | null>(null, [Validators.required, Validators.min(L.tolerance.min), Validators.max(L.tolerance.max)]),
    note: this.fb.control('', [Validators.maxLength(L.noteMax)]),
    retired: this.fb.control(false),
  });
  protected readonly title = computed(() => (this.toleranceClass() ? `Change ${this.toleranceClass()!.name}` : 'Add a product class'));

  constructor() {
    effect(() => {
      this.savedCount();
      const current = this.toleranceClass();
      untracked(() => {
        this.form.reset();
        if (current) this.form.patchValue(current);
      });
    });
  }

  protected submit(): void {
    if (!readyToSubmit(this.form)) return;
    const value = this.form.getRawValue();
    this.submitted.emit({ name: value.name.trim(), tolerancePercentVolume: value.tolerancePercentVolume!, note: value.note.trim(), retired: value.retired });
  }
}
