import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { StyleTargetComparison } from '@shared/recipes';

/** One predicted figure drawn against its style range, with the verdict in words. */
@Component({
  selector: 'cw-style-target-bar',
  imports: [DecimalPipe],
  templateUrl: './style-target-bar.html',
  styleUrl: './style-target-bar.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StyleTargetBar {
  readonly comparison = input.required<StyleTargetComparison>();
  /** Decimal format of the figure, as for the number pipe. */
  readonly digits = input('1.0-1');

  /** The drawn scale runs one range-width either side of the range. */
  protected readonly geometry = computed(() => {
    const { range, value } = this.comparison();
    const width = Math.max(range.max - range.min, Number.EPSILON);
    const start = range.min - width;
    const span = width * 3;
    const at = (x: number) => Math.min(Math.max(((x - start) / span) * 100, 0), 100);
    return { rangeLeft: at(range.min), rangeWidth: at(range.max) - at(range.min), marker: value === null ? null : at(value) };
  });

  protected readonly verdict = computed(() => {
    const position = this.comparison().position;
    return position === null ? 'not predicted yet' : position === 'within' ? 'within the style' : `${position} the style`;
  });
}
