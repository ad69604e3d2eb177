import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { BATCH_STATUSES } from '@shared/batches';
import { ProductionReport } from '@shared/production-report';
import { monthLabel } from '../production-charts/production-chart-data';

const percent = (share: number) => `${(share * 100).toFixed(1)} %`;

/** The report's months as a table: the figures behind the charts, readable at phone width. */
@Component({
  selector: 'cw-production-month-table',
  templateUrl: './production-month-table.html',
  styleUrl: './production-month-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductionMonthTable {
  readonly report = input.required<ProductionReport>();

  protected readonly rows = computed(() =>
    this.report().months.map((m) => ({
      month: m.month,
      label: monthLabel(m.month) + (m.complete ? '' : ' (so far)'),
      litres: `${m.litresBrewed.toFixed(1)} L`,
      batchesBrewed: m.batchesBrewed,
      statuses: BATCH_STATUSES.filter((s) => m.batchesByStatus[s] > 0).map((s) => `${m.batchesByStatus[s]} ${s}`).join(' · ') || 'none',
      inUse: percent(m.room.inUse),
      maintenance: percent(m.room.maintenance),
      fermenters: this.report().fermenters.map((f) => ({ code: f.code, inUse: percent(m.fermenters.find((x) => x.kitItemId === f.id)?.inUse ?? 0) })),
    })),
  );
}
