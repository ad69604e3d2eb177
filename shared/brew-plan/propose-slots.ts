import { DateTime } from 'luxon';
import { BrewSchedule, scheduleTotalDays } from './brew-schedule';
import { BusyInterval, PlanFermenter } from './busy-interval';
import { heldEnd, placeOnDays, PlacedSchedule } from './slot-placement';
import { zoneDays } from './zone-days';

/** What the planner needs to propose slots. */
export interface ProposalInput {
  fermenters: readonly PlanFermenter[];
  busy: readonly BusyInterval[];
  volumeLitres: number;
  schedule: BrewSchedule;
  /** Any day of the wanted week, yyyy-MM-dd; the search starts on that week's Monday. */
  wantedWeek: string;
  zone: string;
  /** No slot may start before this instant (ms). */
  notBefore: number;
  /** Nor after this one (ms): how far ahead bookings are taken. */
  notAfter: number;
  /** Days searched from the week's Monday. */
  searchDays: number;
  /** Most proposals returned (one per fermenter at most). */
  limit: number;
}

/** A free slot: the batch's whole schedule on one fermenter, with its cleaning turnaround. */
export interface Slot {
  fermenter: PlanFermenter;
  placed: PlacedSchedule;
  /** End of the turnaround after packaging (ms). */
  heldUntil: number;
}

/** Sorted, merged spans of one item, so one binary search answers "is [s, e) free?". */
function mergedSpans(busy: readonly BusyInterval[], kitItemId: number): [number, number][] {
  const spans = busy.filter((b) => b.kitItemId === kitItemId && b.end > b.start).map((b): [number, number] => [b.start, b.end]);
  spans.sort((a, b) => a[0] - b[0]);
  const merged: [number, number][] = [];
  for (const span of spans) {
    const last = merged[merged.length - 1];
    if (last && span[0] <= last[1]) last[1] = Math.max(last[1], span[1]);
    else merged.push([span[0], span[1]]);
  }
  return merged;
}

function isFree(spans: readonly [number, number][], start: number, end: number): boolean {
  let lo = 0;
  let hi = spans.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (spans[mid][1] <= start) lo = mid + 1;
    else hi = mid;
  }
  return lo === spans.length || spans[lo][0] >= end;
}

/** Whether the item can take the batch at all: in service and big enough. */
export function fermenterFits(fermenter: PlanFermenter, volumeLitres: number): boolean {
  return fermenter.inService && fermenter.capacityLitres !== null && fermenter.capacityLitres >= volumeLitres;
}

/** The brew dates searched, from the wanted week's Monday, each placed once. */
function candidateDays(input: ProposalInput): PlacedSchedule[] {
  const monday = DateTime.fromISO(input.wantedWeek, { zone: input.zone }).startOf('week').toISODate()!;
  const days = zoneDays(monday, input.searchDays + scheduleTotalDays(input.schedule) + 1, input.zone);
  const placements: PlacedSchedule[] = [];
  for (let d = 0; d < input.searchDays; d++) {
    const placed = placeOnDays(days, d, input.schedule, input.zone);
    if (placed.start > input.notAfter) break;
    if (placed.start >= input.notBefore) placements.push(placed);
  }
  return placements;
}

/**
 * The earliest slot on each fermenter that is in service, holds the volume and is free for the
 * whole schedule plus its turnaround; earliest first, then the smallest fermenter that fits.
 */
export function proposeSlots(input: ProposalInput): Slot[] {
  const days = candidateDays(input);
  const slots: Slot[] = [];
  for (const fermenter of input.fermenters) {
    if (!fermenterFits(fermenter, input.volumeLitres)) continue;
    const spans = mergedSpans(input.busy, fermenter.id);
    const placed = days.find((day) => isFree(spans, day.start, heldEnd(day, fermenter.turnaroundHours)));
    if (placed) slots.push({ fermenter, placed, heldUntil: heldEnd(placed, fermenter.turnaroundHours) });
  }
  slots.sort((a, b) => a.placed.start - b.placed.start || a.fermenter.capacityLitres! - b.fermenter.capacityLitres! || a.fermenter.code.localeCompare(b.fermenter.code));
  return slots.slice(0, input.limit);
}
