import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormArray, ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { unitLabel, UnitSystem } from '@shared/recipes';
import { MashStepGroup } from '../recipe-form/recipe-form-groups';

/** The mash schedule: a named rest at a temperature for a time, in order. */
@Component({
  selector: 'cw-mash-step-rows',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatButton, MatIconButton, MatIcon],
  templateUrl: './mash-step-rows.html',
  styleUrl: '../recipe-form/ingredient-rows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MashStepRows {
  readonly rows = input.required<FormArray<MashStepGroup>>();
  readonly unitSystem = input<UnitSystem>('metric');
  readonly editable = input(true);
  readonly addRequested = output<void>();
  readonly removeRequested = output<number>();

  protected temperatureUnit(): string {
    return unitLabel('temperature', this.unitSystem());
  }
}
