import { BatchStatus } from '../batches/batch-status';
import { Utilisation } from '../brew-plan/utilisation';

export const REPORTS_PATH = '/api/reports';
export const PRODUCTION_REPORT_PATH = `${REPORTS_PATH}/production`;
export const PRODUCTION_REPORT_CSV_PATH = `${REPORTS_PATH}/production.csv`;

/*
 * Routes (admins only):
 *   GET /api/reports/production?from=yyyy-MM&to=yyyy-MM       ProductionReport
 *   GET /api/reports/production.csv?from=yyyy-MM&to=yyyy-MM   the same months as CSV
 */

/** One fermenter's share of a month in use and blocked for maintenance (0–1). */
export interface FermenterMonth extends Utilisation {
  kitItemId: number;
}

/** What the co-op brewed and how full its fermenters were in one calendar month of its zone. */
export interface ProductionMonth {
  /** yyyy-MM */
  month: string;
  /** Batches whose brew day (first recorded step past planned) falls in the month, and their litres. */
  batchesBrewed: number;
  litresBrewed: number;
  /** Every batch by the status it had at the month's end (or now, for this month). */
  batchesByStatus: Record<BatchStatus, number>;
  /** Fermenters in use (batches held in them, bookings with their turnaround) and under maintenance. */
  room: Utilisation;
  fermenters: FermenterMonth[];
  /** False for this month: the figures run until now. */
  complete: boolean;
}

export interface ReportFermenter {
  id: number;
  code: string;
  name: string;
}

export interface ProductionReport {
  from: string;
  to: string;
  timeZone: string;
  fermenters: ReportFermenter[];
  months: ProductionMonth[];
}
