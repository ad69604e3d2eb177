import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { AuditedRow } from '@shared/science';
import type { ExcessVolumePoint } from '@shared/reference-tables';
import { excessVolumeChartData } from './excess-volume-chart-data';

/** Excess molar volume against mole fraction: the table's rows, its suspect rows and the fitted curve. */
@Component({
  selector: 'cw-excess-volume-chart',
  imports: [BaseChartDirective],
  template: `
    <figure>
      <div class="frame">
        <canvas baseChart type="scatter" [data]="data()" [options]="options" role="img"
          [attr.aria-label]="'Excess molar volume against mole fraction: ' + rows().length + ' rows, ' + suspectCount() + ' suspect, with the fitted curve'"></canvas>
      </div>
      <figcaption>Excess molar volume (cm³/mol) against the mole fraction of ethanol. A row off the smooth curve is a suspect: often a typing error.</figcaption>
    </figure>
  `,
  styles: `
    .frame { position: relative; height: 320px; }
    figure { margin: 0 0 16px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ExcessVolumeChart {
  readonly rows = input.required<AuditedRow[]>();
  readonly curve = input.required<ExcessVolumePoint[]>();

  protected readonly data = computed(() => excessVolumeChartData(this.rows(), this.curve()));
  protected readonly suspectCount = computed(() => this.rows().filter((r) => r.flagged).length);
  protected readonly options: ChartOptions<'scatter'> = {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: {
      x: { type: 'linear', min: 0, max: 1, title: { display: true, text: 'Mole fraction of ethanol' } },
      y: { title: { display: true, text: 'Excess molar volume (cm³/mol)' } },
    },
  };
}
