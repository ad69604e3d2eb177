import { ChangeDetectionStrategy, Component, computed, inject, OnInit, signal } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { MatButtonToggle, MatButtonToggleGroup } from '@angular/material/button-toggle';
import { MatIcon } from '@angular/material/icon';
import { Store } from '@ngrx/store';
import { PRODUCTION_REPORT_CSV_PATH, PRODUCTION_REPORT_LIMITS } from '@shared/production-report';
import { authFeature } from '@app/auth/state/auth.feature';
import { ProductionCharts } from '../production-charts/production-charts';
import { ProductionMonthTable } from '../production-month-table/production-month-table';
import { monthsEndingNow } from '../report-range';
import { ProductionReportPageActions } from '../state/production-report-page.actions';
import { productionReportFeature } from '../state/production-report.feature';

/** Admins: litres brewed, batches by status and fermenter utilisation per month, as charts, a table and CSV. */
@Component({
  selector: 'cw-production-report-page',
  imports: [ProductionCharts, ProductionMonthTable, MatAnchor, MatButtonToggleGroup, MatButtonToggle, MatIcon],
  templateUrl: './production-report-page.html',
  styleUrl: './production-report-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductionReportPage implements OnInit {
  private readonly store = inject(Store);

  protected readonly zone = this.store.selectSignal(authFeature.selectCoopTimeZone);
  protected readonly report = this.store.selectSignal(productionReportFeature.selectReport);
  protected readonly loading = this.store.selectSignal(productionReportFeature.selectLoading);
  protected readonly loadError = this.store.selectSignal(productionReportFeature.selectLoadError);
  protected readonly monthChoices = PRODUCTION_REPORT_LIMITS.monthChoices;
  protected readonly months = signal(12);
  protected readonly range = computed(() => monthsEndingNow(this.months(), this.zone()));
  protected readonly csvHref = computed(() => `${PRODUCTION_REPORT_CSV_PATH}?from=${this.range().from}&to=${this.range().to}`);
  protected readonly csvName = computed(() => `production-${this.range().from}-to-${this.range().to}.csv`);

  ngOnInit(): void {
    this.store.dispatch(ProductionReportPageActions.opened(this.range()));
  }

  protected changeMonths(months: number): void {
    this.months.set(months);
    this.store.dispatch(ProductionReportPageActions.rangeChanged(this.range()));
  }
}
