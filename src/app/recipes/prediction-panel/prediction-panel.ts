import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { HOP_STAND_TEMPERATURE_C, hopTimingText, RecipePrediction, StyleTargetComparison, UnitSystem } from '@shared/recipes';
import { ColourSwatch } from '../colour-swatch/colour-swatch';
import { StyleTargetBar } from '../style-target-bar/style-target-bar';
import { WaterPlan } from '../water-plan/water-plan';

/** Number formats of each target, as for the number pipe. */
export const TARGET_DIGITS: Record<StyleTargetComparison['key'], string> = {
  og: '1.3-3',
  fg: '1.3-3',
  abv: '1.1-1',
  ibu: '1.0-0',
  colourSrm: '1.1-1',
};

/** The live predictions of a design: figures, style targets, bill shares, bitterness, strength working, water. */
@Component({
  selector: 'cw-prediction-panel',
  imports: [DecimalPipe, ColourSwatch, StyleTargetBar, WaterPlan],
  templateUrl: './prediction-panel.html',
  styleUrl: './prediction-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PredictionPanel {
  readonly prediction = input.required<RecipePrediction | null>();
  readonly comparisons = input<readonly StyleTargetComparison[]>([]);
  readonly styleName = input<string | null>(null);
  readonly unitSystem = input<UnitSystem>('metric');

  protected readonly digits = TARGET_DIGITS;
  protected readonly timing = hopTimingText;
  protected readonly standTemperature = HOP_STAND_TEMPERATURE_C;
  protected readonly hasHopStand = computed(() => this.prediction()?.hopBitterness.some((hop) => hop.use === 'whirlpool') ?? false);
}
