import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { FormArray, ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { Fermentable, unitLabel, UnitSystem } from '@shared/recipes';
import { FermentableGroup, limitIn, SI_LIMITS } from '../recipe-form/recipe-form-groups';

/** The grain bill's rows: a catalogue fermentable and its amount each. */
@Component({
  selector: 'cw-fermentable-rows',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatSelect, MatOption, MatButton, MatIconButton, MatIcon],
  templateUrl: './fermentable-rows.html',
  styleUrl: '../recipe-form/ingredient-rows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FermentableRows {
  readonly rows = input.required<FormArray<FermentableGroup>>();
  readonly fermentables = input.required<readonly Fermentable[]>();
  readonly unitSystem = input<UnitSystem>('metric');
  readonly editable = input(true);
  readonly addRequested = output<void>();
  readonly removeRequested = output<number>();

  protected readonly maxAmount = computed(() => limitIn('grain-mass', SI_LIMITS.amountKg, this.unitSystem()));

  protected massUnit(): string {
    return unitLabel('grain-mass', this.unitSystem());
  }
}
