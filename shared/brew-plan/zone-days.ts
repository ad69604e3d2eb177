import { DateTime } from 'luxon';

const HOUR_MS = 3_600_000;

/** One calendar day of the co-op's zone on the time line. */
export interface ZoneDay {
  /** yyyy-MM-dd */
  date: string;
  midnight: number;
  /** False on a day the clocks change, when hours are not midnight plus n. */
  regular: boolean;
}

/** Days already placed, by zone and date: a calendar day's midnight in a zone never changes. */
const placedDays = new Map<string, ZoneDay>();
const PLACED_DAYS_KEPT = 20_000;

function zoneDay(date: string, zone: string): ZoneDay {
  const key = `${zone} ${date}`;
  const known = placedDays.get(key);
  if (known) return known;
  const day = DateTime.fromISO(date, { zone });
  const midnight = day.toMillis();
  const placed = { date, midnight, regular: day.plus({ days: 1 }).toMillis() - midnight === 24 * HOUR_MS };
  if (placedDays.size >= PLACED_DAYS_KEPT) placedDays.clear();
  placedDays.set(key, placed);
  return placed;
}

/**
 * `count` consecutive days from `first` (yyyy-MM-dd) in `zone`. The planner tries hundreds of brew
 * dates over the same weeks, so each day's offset is worked out once, not for every phase boundary.
 */
export function zoneDays(first: string, count: number, zone: string): ZoneDay[] {
  const [y, m, d] = first.split('-').map(Number);
  return Array.from({ length: count }, (_, i) => zoneDay(new Date(Date.UTC(y, m - 1, d + i)).toISOString().slice(0, 10), zone));
}

/** The instant of a whole hour of the day in `zone`. */
export function hourOfDay(day: ZoneDay, hour: number, zone: string): number {
  return day.regular ? day.midnight + hour * HOUR_MS : DateTime.fromMillis(day.midnight, { zone }).set({ hour }).toMillis();
}
