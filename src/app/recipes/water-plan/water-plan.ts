import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RecipeWaterPlan, toDisplayUnits, unitLabel, UnitSystem } from '@shared/recipes';

/** Strike and sparge water, strike temperature and the kettle before the boil, in the person's units. */
@Component({
  selector: 'cw-water-plan',
  imports: [DecimalPipe],
  template: `
    @let v = shown();
    <dl class="plan">
      <div><dt>Strike water</dt><dd data-testid="water-strike">{{ v.strike | number: '1.1-1' }} {{ v.volumeUnit }}</dd></div>
      <div><dt>Strike temperature</dt><dd data-testid="water-strike-temperature">{{ v.strikeTemperature | number: '1.1-1' }} {{ v.temperatureUnit }}</dd></div>
      <div><dt>Sparge water</dt><dd data-testid="water-sparge">{{ v.sparge | number: '1.1-1' }} {{ v.volumeUnit }}</dd></div>
      <div><dt>Pre-boil volume</dt><dd data-testid="water-pre-boil">{{ v.preBoil | number: '1.1-1' }} {{ v.volumeUnit }}</dd></div>
      <div><dt>Pre-boil gravity</dt><dd data-testid="water-pre-boil-gravity">{{ v.preBoilGravity | number: '1.3-3' }}</dd></div>
      <div><dt>Mash efficiency this implies</dt><dd data-testid="water-mash-efficiency">{{ v.mashEfficiency | number: '1.0-0' }} %</dd></div>
    </dl>
    @if (v.kettleCapacity !== null && v.exceedsKettle) {
      <p class="warn" role="alert" data-testid="water-kettle-warning">
        The pre-boil wort ({{ v.preBoil | number: '1.1-1' }} {{ v.volumeUnit }}) does not fit the kettle
        ({{ v.kettleCapacity | number: '1.1-1' }} {{ v.volumeUnit }}): a smaller batch, a shorter boil or a second kettle.
        Boiling wort over the brim scalds.
      </p>
    }
  `,
  styles:
    '.plan { margin: 0; } .plan div { display: flex; justify-content: space-between; gap: 8px; font-size: 0.9rem; } dd { margin: 0; font-weight: 600; }' +
    ' .warn { color: var(--mat-sys-error); font-size: 0.9rem; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaterPlan {
  readonly plan = input.required<RecipeWaterPlan>();
  readonly unitSystem = input<UnitSystem>('metric');

  protected readonly shown = computed(() => {
    const plan = this.plan();
    const system = this.unitSystem();
    return {
      strike: toDisplayUnits('volume', plan.strikeLitres, system),
      sparge: toDisplayUnits('volume', plan.spargeLitres, system),
      preBoil: toDisplayUnits('volume', plan.preBoilLitres, system),
      strikeTemperature: toDisplayUnits('temperature', plan.strikeTemperatureC, system),
      preBoilGravity: plan.preBoilGravity,
      mashEfficiency: plan.mashEfficiencyPercent,
      kettleCapacity: plan.kettleCapacityLitres === null ? null : toDisplayUnits('volume', plan.kettleCapacityLitres, system),
      exceedsKettle: plan.exceedsKettle,
      volumeUnit: unitLabel('volume', system),
      temperatureUnit: unitLabel('temperature', system),
    };
  });
}
