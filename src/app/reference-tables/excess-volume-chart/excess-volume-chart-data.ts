import type { ChartData } from 'chart.js';
import type { AuditedRow } from '@shared/science';
import type { ExcessVolumePoint } from '@shared/reference-tables';

const SPRUCE = '#2F5D50';
const COPPER = '#B86B3C';

/** The table's rows (suspect ones apart) and the fitted Redlich–Kister curve, as chart datasets. */
export function excessVolumeChartData(rows: readonly AuditedRow[], curve: readonly ExcessVolumePoint[]): ChartData<'scatter'> {
  const point = (r: AuditedRow) => ({ x: r.moleFraction, y: r.excessMolarVolume });
  return {
    datasets: [
      { label: 'Rows of the table', data: rows.filter((r) => !r.flagged).map(point), backgroundColor: SPRUCE, borderColor: SPRUCE, pointRadius: 3 },
      { label: 'Suspect rows', data: rows.filter((r) => r.flagged).map(point), backgroundColor: COPPER, borderColor: COPPER, pointRadius: 6, pointStyle: 'triangle' },
      { label: 'Fitted Redlich–Kister curve', data: curve.map((p) => ({ x: p.x, y: p.y })), showLine: true, pointRadius: 0, borderColor: SPRUCE, borderWidth: 1.5, backgroundColor: SPRUCE },
    ],
  };
}
