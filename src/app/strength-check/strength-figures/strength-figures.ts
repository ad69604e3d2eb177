import { DecimalPipe } from '@angular/common';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { INSTRUMENT_LABELS } from '@shared/readings';
import { BatchStrengthFigures, GravityReadingUsed, LabComparison } from '@shared/strength-check';

/** The working of a strength: readings used, each step, the two estimates beside the density-based figure, and the lab's. */
@Component({
  selector: 'cw-strength-figures',
  imports: [DecimalPipe, ZonedDateTimePipe],
  templateUrl: './strength-figures.html',
  styleUrl: './strength-figures.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthFigures {
  readonly figures = input.required<BatchStrengthFigures>();
  readonly readingsUsed = input.required<GravityReadingUsed[]>();
  readonly latestLab = input<LabComparison | null>(null);
  readonly timeZone = input.required<string>();

  protected readonly instruments = INSTRUMENT_LABELS;
}
