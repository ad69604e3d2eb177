import type { ChartData, ChartOptions } from 'chart.js';
import { DateTime } from 'luxon';
import { BATCH_STATUS_LABELS, BATCH_STATUSES, BatchStatus } from '@shared/batches';
import { ProductionReport } from '@shared/production-report';

const SPRUCE = '#2F5D50';
const COPPER = '#B86B3C';
const STATUS_COLOURS: Record<BatchStatus, string> = {
  planned: '#A7B3AE',
  brewing: COPPER,
  fermenting: SPRUCE,
  conditioning: '#6E9A8C',
  packaged: '#D6A35C',
  archived: '#CFC8BE',
};

/** "2026-10" as "Oct 2026". */
export function monthLabel(month: string): string {
  return DateTime.fromFormat(month, 'yyyy-MM').toFormat('LLL yyyy');
}

const percent = (share: number) => Math.round(share * 1000) / 10;

export function litresChartData(report: ProductionReport): ChartData<'bar'> {
  return {
    labels: report.months.map((m) => monthLabel(m.month)),
    datasets: [{ label: 'Litres brewed', data: report.months.map((m) => m.litresBrewed), backgroundColor: COPPER }],
  };
}

export function statusChartData(report: ProductionReport): ChartData<'bar'> {
  return {
    labels: report.months.map((m) => monthLabel(m.month)),
    datasets: BATCH_STATUSES.map((s) => ({ label: BATCH_STATUS_LABELS[s], data: report.months.map((m) => m.batchesByStatus[s]), backgroundColor: STATUS_COLOURS[s] })),
  };
}

/** The room's fermenters: share of the month in use and under maintenance, in percent. */
export function utilisationChartData(report: ProductionReport): ChartData<'bar'> {
  return {
    labels: report.months.map((m) => monthLabel(m.month)),
    datasets: [
      { label: 'In use %', data: report.months.map((m) => percent(m.room.inUse)), backgroundColor: SPRUCE },
      { label: 'Under maintenance %', data: report.months.map((m) => percent(m.room.maintenance)), backgroundColor: '#C9C2B8' },
    ],
  };
}

/** Bar options with the y axis titled; stacked when the bars add up to a whole. */
export function barOptions(yTitle: string, stacked: boolean, max?: number): ChartOptions<'bar'> {
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    scales: {
      x: { stacked },
      y: { stacked, beginAtZero: true, max, title: { display: true, text: yTitle } },
    },
  };
}
