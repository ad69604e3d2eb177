import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import 'chartjs-adapter-luxon';
import { BaseChartDirective } from 'ng2-charts';
import type { ChartReading, FermentationForecast } from '@shared/fermentation';
import { gravityChartData, gravityChartOptions } from './gravity-chart-data';

/** Gravity and temperature of a batch over time, with the forecast curve and its band. */
@Component({
  selector: 'cw-gravity-chart',
  imports: [BaseChartDirective],
  template: `
    <div class="frame">
      <canvas baseChart type="line" [data]="data()" [options]="options()" role="img"
        [attr.aria-label]="'Gravity and temperature over time, ' + readings().length + ' readings' + (forecast() ? ', with the forecast and its band' : '')"></canvas>
    </div>
  `,
  styles: `.frame { position: relative; height: 360px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GravityChart {
  readonly readings = input.required<ChartReading[]>();
  readonly forecast = input<FermentationForecast | null>(null);
  readonly timeZone = input('UTC');

  protected readonly data = computed(() => gravityChartData(this.readings(), this.forecast()));
  protected readonly options = computed(() => gravityChartOptions(this.timeZone()));
}
