import { BATCH_STATUSES, BatchStatus } from '../batches/batch-status';
import { BusyInterval } from '../brew-plan/busy-interval';

const HOUR_MS = 3_600_000;

/** A batch as the report reads it: its litres, its fermenter and when it reached each status. */
export interface ReportBatch {
  id: number;
  name: string;
  /** Litres into the fermenter as measured on brew day, else the planned volume. */
  litres: number;
  fermenterKitItemId: number | null;
  /** When each status was reached (ms since the epoch); null when skipped or not reached. */
  reached: Record<BatchStatus, number | null>;
}

/** The status the batch had at `at`, or null when it did not exist yet. */
export function statusAt(batch: ReportBatch, at: number): BatchStatus | null {
  let status: BatchStatus | null = null;
  for (const s of BATCH_STATUSES) {
    const when = batch.reached[s];
    if (when !== null && when <= at) status = s;
  }
  return status;
}

/** The brew day: the first step past planned that was recorded short of archiving; null when never brewed. */
export function brewedAt(batch: ReportBatch): number | null {
  for (const s of ['brewing', 'fermenting', 'conditioning', 'packaged'] as const) {
    if (batch.reached[s] !== null) return batch.reached[s];
  }
  return null;
}

/**
 * The span a batch held its fermenter: from fermenting (or conditioning, when fermenting was
 * skipped) until packaged or archived plus the fermenter's cleaning turnaround; until `now` while
 * it still holds it. Null when it never held one.
 */
export function fermenterSpan(batch: ReportBatch, turnaroundHours: number, now: number): BusyInterval | null {
  const start = batch.reached.fermenting ?? batch.reached.conditioning;
  if (batch.fermenterKitItemId === null || start === null) return null;
  const released = batch.reached.packaged ?? batch.reached.archived;
  const end = released === null ? now : released + turnaroundHours * HOUR_MS;
  if (end <= start) return null;
  return { kitItemId: batch.fermenterKitItemId, kind: 'batch', start, end, refId: batch.id, label: batch.name };
}
