import { FERMENTER_HOLDING_STATUSES } from '@shared/batches';
import { Booking } from '@shared/bookings';
import { batchOccupancy, BatchOccupancy, BusyInterval, expectedRelease, heldEnd, OccupyingBatch } from '@shared/brew-plan';
import { CalendarBatch, PlanCalendar } from './plan-calendar';

/** A fermenter held by a fermenting or conditioning batch with no expected release stays held until it is packaged. */
const UNTIL_PACKAGED = Number.MAX_SAFE_INTEGER;

/** A calendar batch as the pure occupancy rules see it. */
export function occupyingBatch(b: CalendarBatch, forecasts: ReadonlyMap<number, number>): OccupyingBatch {
  return {
    status: b.status, brewDate: b.brewDate, schedule: b.schedule, fermentingAt: b.fermentingAt, conditioningAt: b.conditioningAt,
    forecastFinish: forecasts.get(b.id) ?? null,
    booking: b.booking ? { start: b.booking.startsAt.getTime(), end: b.booking.endsAt.getTime() } : null,
  };
}

export function bookingBusy(booking: Booking): BusyInterval {
  const what = booking.purpose === 'maintenance' ? 'maintenance block' : `booking by ${booking.userName}`;
  return {
    kitItemId: booking.kitItemId,
    kind: booking.purpose === 'maintenance' ? 'maintenance' : 'booking',
    start: Date.parse(booking.startsAt),
    end: Date.parse(booking.heldUntil),
    refId: booking.id,
    label: `${what} #${booking.id}`,
  };
}

/** When each holding batch with a forecast is expected to hand its fermenter back, cleaning included (ms). */
export function expectedReleases(calendar: PlanCalendar, forecasts: ReadonlyMap<number, number>, zone: string, now: number): Map<number, number> {
  const releases = new Map<number, number>();
  for (const b of calendar.batches) {
    const release = expectedRelease(occupyingBatch(b, forecasts), turnaroundOf(calendar, b.fermenterId), zone, now);
    if (release !== null) releases.set(b.id, release);
  }
  return releases;
}

/** Each batch's expected occupancy; `forecasts` holds fermenting batches' forecast finishes (ms). */
export function occupancies(batches: readonly CalendarBatch[], forecasts: ReadonlyMap<number, number>, zone: string, now: number): Map<number, BatchOccupancy> {
  return new Map(
    batches.map((b) => [
      b.id,
      batchOccupancy(occupyingBatch(b, forecasts), zone, now),
    ]),
  );
}

function turnaroundOf(calendar: PlanCalendar, kitItemId: number): number {
  return calendar.fermenters.find((f) => f.id === kitItemId)?.turnaroundHours ?? 0;
}

/**
 * What the planner must not touch: every booking's hold, every planned batch's schedule with its
 * turnaround, and a fermenter a batch is fermenting or conditioning in, until its expected release
 * (`releases`, from the gravity forecast) or, with none, until that batch is packaged.
 */
export function planningBusy(calendar: PlanCalendar, occupancy: ReadonlyMap<number, BatchOccupancy>, releases: ReadonlyMap<number, number>, exceptBatchId?: number): BusyInterval[] {
  // A holder's expected release stands in for the booking made for it, which counted on the planned end.
  const replaced = (batchId: number | null) => batchId !== null && (batchId === exceptBatchId || releases.has(batchId));
  const busy = calendar.bookings.filter((b) => !replaced(b.batchId)).map(bookingBusy);
  for (const batch of calendar.batches) {
    if (batch.id === exceptBatchId) continue;
    const occ = occupancy.get(batch.id)!;
    const holding = FERMENTER_HOLDING_STATUSES.includes(batch.status);
    const end = holding ? (releases.get(batch.id) ?? UNTIL_PACKAGED) : heldEnd(occ, turnaroundOf(calendar, batch.fermenterId));
    busy.push({ kitItemId: batch.fermenterId, kind: 'batch', start: occ.start, end, refId: batch.id, label: `batch "${batch.name}" #${batch.id}` });
  }
  return busy;
}

/** What the timeline counts as used: batches as expected (with turnaround) and bookings not made for a shown batch. */
export function timelineBusy(calendar: PlanCalendar, occupancy: ReadonlyMap<number, BatchOccupancy>): BusyInterval[] {
  const shown = new Set(calendar.batches.map((b) => b.id));
  const busy = calendar.bookings.filter((b) => b.batchId === null || !shown.has(b.batchId)).map(bookingBusy);
  for (const batch of calendar.batches) {
    const occ = occupancy.get(batch.id)!;
    busy.push({ kitItemId: batch.fermenterId, kind: 'batch', start: occ.start, end: heldEnd(occ, turnaroundOf(calendar, batch.fermenterId)), refId: batch.id, label: batch.name });
  }
  return busy;
}
