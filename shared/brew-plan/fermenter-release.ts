import { batchOccupancy, OccupyingBatch } from './batch-occupancy';
import { heldEnd } from './slot-placement';

/**
 * When a batch in a fermenter is expected to hand it back, cleaning included (ms), or null while
 * nothing but packaging tells: only a fermenting batch whose gravity log gives a forecast finish
 * has an expected end. Its conditioning runs from the later of that finish plus the conditioning
 * days and now (a batch still in the fermenter is not out of it yet), then a packaging day, then
 * the fermenter's turnaround: the same end the timeline draws.
 */
export function expectedRelease(batch: OccupyingBatch, turnaroundHours: number, zone: string, now: number): number | null {
  if (batch.status !== 'fermenting' || batch.forecastFinish === null) return null;
  return heldEnd(batchOccupancy(batch, zone, now), turnaroundHours);
}
