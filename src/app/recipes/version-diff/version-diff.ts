import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RecipePrediction, RecipeVersion } from '@shared/recipes';
import { DesignDifference } from '../view-models/design-differences';

/** Two versions side by side, line by line, with changed lines marked; the predictions of both on top. */
@Component({
  selector: 'cw-version-diff',
  imports: [DecimalPipe],
  templateUrl: './version-diff.html',
  styleUrl: './version-diff.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VersionDiff {
  readonly left = input.required<RecipeVersion>();
  readonly right = input.required<RecipeVersion>();
  readonly rows = input.required<readonly DesignDifference[]>();
  readonly predictions = input.required<readonly [RecipePrediction, RecipePrediction]>();

  protected readonly changedCount = computed(() => this.rows().filter((row) => row.changed).length);
  protected readonly figures = computed(() => {
    const [a, b] = this.predictions();
    const line = (label: string, digits: string, l: number | null, r: number | null) => ({ label, digits, left: l, right: r, changed: l?.toFixed(4) !== r?.toFixed(4) });
    return [
      line('OG', '1.3-3', a.og, b.og),
      line('FG', '1.3-3', a.fg, b.fg),
      line('ABV density-based (%)', '1.1-1', a.abvDensityBased, b.abvDensityBased),
      line('IBU', '1.0-0', a.ibu, b.ibu),
      line('Colour (SRM)', '1.1-1', a.colourSrm, b.colourSrm),
    ];
  });
}
