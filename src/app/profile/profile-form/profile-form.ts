import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { PERSON_NAME_MAX_LENGTH, Profile, UpdateProfileRequest } from '@shared/profile';
import { UnitSystem } from '@shared/recipes';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { readyToSubmit } from '@app/ui/ready-to-submit';

/** The person's name and the units recipes are shown in. */
@Component({
  selector: 'cw-profile-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatError, MatInput, MatButton, MatButtonToggleGroup, MatButtonToggle],
  templateUrl: './profile-form.html',
  styles: '.units { display: flex; flex-wrap: wrap; align-items: center; gap: 12px; margin-bottom: 16px; } .email { margin-top: 0; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProfileForm {
  readonly profile = input.required<Profile>();
  readonly pending = input(false);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly submitted = output<UpdateProfileRequest>();

  protected readonly maxName = PERSON_NAME_MAX_LENGTH;
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(PERSON_NAME_MAX_LENGTH)]],
    unitSystem: ['metric' as UnitSystem],
  });

  constructor() {
    effect(() => {
      const { name, unitSystem } = this.profile();
      this.form.reset({ name, unitSystem });
    });
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
  }

  protected submit(): void {
    if (!readyToSubmit(this.form, this.pending())) return;
    const { name, unitSystem } = this.form.getRawValue();
    this.submitted.emit({ name: name.trim(), unitSystem });
  }
}
