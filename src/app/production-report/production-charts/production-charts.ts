import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { BaseChartDirective } from 'ng2-charts';
import { ProductionReport } from '@shared/production-report';
import { barOptions, litresChartData, statusChartData, utilisationChartData } from './production-chart-data';

/** The report's three charts: litres brewed, batches by status, and how full the fermenters were. */
@Component({
  selector: 'cw-production-charts',
  imports: [BaseChartDirective],
  templateUrl: './production-charts.html',
  styleUrl: './production-charts.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductionCharts {
  readonly report = input.required<ProductionReport>();

  protected readonly litres = computed(() => litresChartData(this.report()));
  protected readonly statuses = computed(() => statusChartData(this.report()));
  protected readonly utilisation = computed(() => utilisationChartData(this.report()));
  protected readonly litresOptions = barOptions('Litres', false);
  protected readonly statusOptions = barOptions('Batches', true);
  protected readonly utilisationOptions = barOptions('% of the month', false, 100);
}
