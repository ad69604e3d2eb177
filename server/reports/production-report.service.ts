import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { buildProductionReport, monthWindows, ProductionReport } from '@shared/production-report';
import { productionReportRepository } from './production-report.repository';

/** The production report: reads the rows its months need and leaves the figures to the pure builder. */
export function createProductionReportService(db: Knex, coopTimeZone: string) {
  return {
    /** This month in the co-op's zone (yyyy-MM): the last a report may cover. */
    thisMonth(now = new Date()): string {
      return DateTime.fromJSDate(now, { zone: coopTimeZone }).toFormat('yyyy-MM');
    },

    async report(from: string, to: string, now = new Date()): Promise<ProductionReport> {
      const windows = monthWindows(from, to, coopTimeZone);
      const start = new Date(windows[0].start);
      const end = new Date(Math.min(windows[windows.length - 1].end, now.getTime()));
      const [batches, fermenters, holds] = await Promise.all([
        productionReportRepository.batches(db),
        productionReportRepository.fermenters(db),
        productionReportRepository.holds(db, start, end),
      ]);
      return buildProductionReport({ from, to, zone: coopTimeZone, now: now.getTime(), batches, fermenters, holds });
    },
  };
}

export type ProductionReportService = ReturnType<typeof createProductionReportService>;
