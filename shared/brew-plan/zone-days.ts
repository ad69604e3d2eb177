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

/**
 * `count` consecutive days from `first` (yyyy-MM-dd) in `zone`. The planner tries hundreds of brew
 * dates, so the zone's offsets are worked out once per day here rather than for every phase boundary.
 */
export function zoneDays(first: string, count: number, zone: string): ZoneDay[] {
  const [y, m, d] = first.split('-').map(Number);
  const days: ZoneDay[] = [];
  let day = DateTime.fromObject({ year: y, month: m, day: d }, { zone });
  for (let i = 0; i < count; i++) {
    const next = day.plus({ days: 1 });
    days.push({ date: new Date(Date.UTC(y, m - 1, d + i)).toISOString().slice(0, 10), midnight: day.toMillis(), regular: next.toMillis() - day.toMillis() === 24 * HOUR_MS });
    day = next;
  }
  return days;
}

/** The instant of a whole hour of the day in `zone`. */
export function hourOfDay(day: ZoneDay, hour: number, zone: string): number {
  return day.regular ? day.midnight + hour * HOUR_MS : DateTime.fromMillis(day.midnight, { zone }).set({ hour }).toMillis();
}
