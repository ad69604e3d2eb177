import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { FormArray, ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { Hop, HOP_USES, HopUse, hopTimeUnit, MAX_HOP_TIME, unitLabel, UnitSystem } from '@shared/recipes';
import { HopGroup, limitIn, SI_LIMITS } from '../recipe-form/recipe-form-groups';

/** The hop additions: hop, amount, time and use each. */
@Component({
  selector: 'cw-hop-rows',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton, MatIconButton, MatIcon],
  templateUrl: './hop-rows.html',
  styleUrl: '../recipe-form/ingredient-rows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HopRows {
  readonly rows = input.required<FormArray<HopGroup>>();
  readonly hops = input.required<readonly Hop[]>();
  readonly unitSystem = input<UnitSystem>('metric');
  readonly editable = input(true);
  readonly addRequested = output<void>();
  readonly removeRequested = output<number>();

  protected readonly uses = HOP_USES;
  protected readonly maxTime = MAX_HOP_TIME;
  protected readonly maxAmount = computed(() => limitIn('hop-mass', SI_LIMITS.amountGrams, this.unitSystem()));

  protected massUnit(): string {
    return unitLabel('hop-mass', this.unitSystem());
  }

  /** Dry hops are timed in days, every other use in minutes. */
  protected timeUnit(use: HopUse): string {
    return hopTimeUnit(use);
  }
}
