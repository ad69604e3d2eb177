import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormArray, ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { OTHER_UNITS, OtherAddition, RECIPE_LIMITS } from '@shared/recipes';
import { OtherGroup } from '../recipe-form/recipe-form-groups';

/** Other additions (spices, finings, water agents…): amount in one of the fixed units and when it goes in. */
@Component({
  selector: 'cw-other-rows',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatSelect, MatOption, MatButton, MatIconButton, MatIcon],
  templateUrl: './other-rows.html',
  styleUrl: '../recipe-form/ingredient-rows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OtherRows {
  readonly rows = input.required<FormArray<OtherGroup>>();
  readonly others = input.required<readonly OtherAddition[]>();
  readonly editable = input(true);
  readonly addRequested = output<void>();
  readonly removeRequested = output<number>();

  protected readonly units = OTHER_UNITS;
  protected readonly limits = RECIPE_LIMITS.otherAmount;
}
