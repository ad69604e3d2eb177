import { BrewSchedule, PlanPhaseName, scheduleTotalDays } from './brew-schedule';
import { hourOfDay, ZoneDay, zoneDays } from './zone-days';

/**
 * The fermenter is taken from the morning of the brew day and handed back in the evening of the
 * packaging day (an assumption of the plan, common practice for a day's work).
 */
export const BREW_DAY_START_HOUR = 8;
export const PACKAGING_DAY_END_HOUR = 18;

const HOUR_MS = 3_600_000;

/** One phase on the time line; instants in ms since the epoch, end exclusive. */
export interface PlacedPhase {
  phase: PlanPhaseName;
  start: number;
  end: number;
}

/** A schedule put on the calendar from a brew date. */
export interface PlacedSchedule {
  brewDate: string;
  start: number;
  end: number;
  phases: PlacedPhase[];
}

/** The fermenter's hold for a placed schedule: its use plus the cleaning turnaround. */
export function heldEnd(placed: { end: number }, turnaroundHours: number): number {
  return placed.end + turnaroundHours * HOUR_MS;
}

/** Lays a schedule out from `days[index]` (needs the schedule's days after it), phases split at midnight. */
export function placeOnDays(days: readonly ZoneDay[], index: number, schedule: BrewSchedule, zone: string): PlacedSchedule {
  const lastDay = index + scheduleTotalDays(schedule) - 1;
  const fermentationEnd = days[index + 1 + schedule.fermentationDays].midnight;
  const conditioningEnd = days[index + 1 + schedule.fermentationDays + schedule.conditioningDays].midnight;
  const phases: PlacedPhase[] = [
    { phase: 'brew', start: hourOfDay(days[index], BREW_DAY_START_HOUR, zone), end: days[index + 1].midnight },
    { phase: 'fermentation', start: days[index + 1].midnight, end: fermentationEnd },
    { phase: 'conditioning', start: fermentationEnd, end: conditioningEnd },
    { phase: 'packaging', start: days[lastDay].midnight, end: hourOfDay(days[lastDay], PACKAGING_DAY_END_HOUR, zone) },
  ];
  return { brewDate: days[index].date, start: phases[0].start, end: phases[3].end, phases: phases.filter((p) => p.end > p.start) };
}

/** Lays a schedule out from `brewDate` (yyyy-MM-dd) in the co-op's zone. */
export function placeSchedule(brewDate: string, schedule: BrewSchedule, zone: string): PlacedSchedule {
  return placeOnDays(zoneDays(brewDate, scheduleTotalDays(schedule) + 1, zone), 0, schedule, zone);
}
