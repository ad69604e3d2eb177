import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { RecipePrediction } from '@shared/recipes';

/** The key predictions in one compact line that stays in sight on a phone; a tap opens the full panel. */
@Component({
  selector: 'cw-prediction-summary',
  imports: [DecimalPipe, MatIcon],
  templateUrl: './prediction-summary.html',
  styleUrl: './prediction-summary.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PredictionSummary {
  readonly prediction = input.required<RecipePrediction | null>();
  readonly panelRequested = output<void>();
}
