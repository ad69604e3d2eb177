import { DatePipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { INSTRUMENT_LABELS } from '@shared/readings';
import { BatchStrengthFigures, GravityReadingUsed, LabComparison } from '@shared/strength-check';

/** The working of a strength: readings used, each step, the two estimates beside the density-based figure, and the lab's. */
@Component({
  selector: 'cw-strength-figures',
  imports: [DecimalPipe, DatePipe],
  templateUrl: './strength-figures.html',
  styleUrl: './strength-figures.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StrengthFigures {
  readonly figures = input.required<BatchStrengthFigures>();
  readonly readingsUsed = input.required<GravityReadingUsed[]>();
  readonly latestLab = input<LabComparison | null>(null);

  protected readonly instruments = INSTRUMENT_LABELS;
}
