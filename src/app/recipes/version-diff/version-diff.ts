import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RecipeVersion } from '@shared/recipes';
import { DesignDifference } from '../view-models/design-differences';

/** Two versions side by side, line by line (predictions first), with changed lines marked and counted. */
@Component({
  selector: 'cw-version-diff',
  templateUrl: './version-diff.html',
  styleUrl: './version-diff.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VersionDiff {
  readonly left = input.required<RecipeVersion>();
  readonly right = input.required<RecipeVersion>();
  readonly rows = input.required<readonly DesignDifference[]>();

  /** Counts the same rows the table marks, so the summary always agrees with them. */
  protected readonly changedCount = computed(() => this.rows().filter((row) => row.changed).length);
}
