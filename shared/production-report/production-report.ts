import { BATCH_STATUSES, BatchStatus } from '../batches/batch-status';
import { BusyInterval, PlanFermenter } from '../brew-plan/busy-interval';
import { utilisationOver } from '../brew-plan/utilisation';
import { brewedAt, fermenterSpan, ReportBatch, statusAt } from './batch-history';
import { ProductionMonth, ProductionReport, ReportFermenter } from './production-report-api';
import { monthWindows } from './report-months';

/** A fermenter of the register as the report counts it. */
export interface ReportKitItem extends ReportFermenter {
  turnaroundHours: number;
  /** Retired fermenters keep their history but leave the room's average. */
  retired: boolean;
}

export interface ProductionReportInput {
  from: string;
  to: string;
  zone: string;
  now: number;
  batches: readonly ReportBatch[];
  fermenters: readonly ReportKitItem[];
  /** Live bookings and maintenance blocks of the fermenters, each until its hold ends. */
  holds: readonly BusyInterval[];
}

const noStatuses = (): Record<BatchStatus, number> => Object.fromEntries(BATCH_STATUSES.map((s) => [s, 0])) as Record<BatchStatus, number>;
/** Litres to 0.1 L, shares to 0.1 %: what the page and the CSV show, summed without float noise. */
const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places;

/**
 * Litres brewed, batches by status and fermenter utilisation per month of the co-op's zone. This
 * month's figures run until `now`; a fermenter counts as in use while a batch holds it (fermenting
 * to packaged, plus its cleaning turnaround) or a booking holds it, and the two never count twice.
 */
export function buildProductionReport(input: ProductionReportInput): ProductionReport {
  const kit = new Map(input.fermenters.map((f) => [f.id, f]));
  const batchSpans = input.batches
    .map((b) => (b.fermenterKitItemId !== null && kit.has(b.fermenterKitItemId) ? fermenterSpan(b, kit.get(b.fermenterKitItemId)!.turnaroundHours, input.now) : null))
    .filter((span): span is BusyInterval => span !== null);
  const busy = [...batchSpans, ...input.holds];
  const planFermenters: PlanFermenter[] = input.fermenters.map((f) => ({ id: f.id, code: f.code, name: f.name, capacityLitres: null, inService: !f.retired, turnaroundHours: f.turnaroundHours }));

  const months = monthWindows(input.from, input.to, input.zone)
    .filter((w) => w.start < input.now)
    .map((w): ProductionMonth => {
      const end = Math.min(w.end, input.now);
      const brewed = input.batches.filter((b) => {
        const at = brewedAt(b);
        return at !== null && at >= w.start && at < end;
      });
      const byStatus = noStatuses();
      for (const b of input.batches) {
        const status = statusAt(b, end - 1);
        if (status) byStatus[status] += 1;
      }
      const use = utilisationOver(planFermenters, busy, w.start, end);
      return {
        month: w.month,
        batchesBrewed: brewed.length,
        litresBrewed: round(brewed.reduce((sum, b) => sum + b.litres, 0), 1),
        batchesByStatus: byStatus,
        room: { inUse: round(use.room.inUse, 4), maintenance: round(use.room.maintenance, 4) },
        fermenters: use.items.map((u) => ({ kitItemId: u.kitItemId, inUse: round(u.inUse, 4), maintenance: round(u.maintenance, 4) })),
        complete: w.end <= input.now,
      };
    });
  return { from: input.from, to: input.to, timeZone: input.zone, fermenters: input.fermenters.map(({ id, code, name }) => ({ id, code, name })), months };
}
