import { BATCH_STATUS_LABELS, BATCH_STATUSES } from '@shared/batches';
import { ProductionReport } from '@shared/production-report';
import { csvOfCells } from '../http/csv-cells';

const percent = (share: number) => (share * 100).toFixed(1);

/**
 * One line per month: litres and batches brewed, batches by status at the month's end, the room's
 * use and maintenance, then each fermenter's use, all shares in percent.
 */
export function productionReportCsv(report: ProductionReport): string {
  const header = [
    'Month',
    'Complete',
    'Litres brewed',
    'Batches brewed',
    ...BATCH_STATUSES.map((s) => `${BATCH_STATUS_LABELS[s]} at month end`),
    'Room in use %',
    'Room under maintenance %',
    ...report.fermenters.map((f) => `${f.code} in use %`),
  ];
  const rows = report.months.map((m) => [
    m.month,
    m.complete ? 'yes' : 'no (until now)',
    m.litresBrewed.toFixed(1),
    String(m.batchesBrewed),
    ...BATCH_STATUSES.map((s) => String(m.batchesByStatus[s])),
    percent(m.room.inUse),
    percent(m.room.maintenance),
    ...report.fermenters.map((f) => percent(m.fermenters.find((x) => x.kitItemId === f.id)?.inUse ?? 0)),
  ]);
  return csvOfCells([header, ...rows]);
}
