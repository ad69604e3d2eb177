import { DateTime } from 'luxon';

/** "Today" as the co-op sees it: an ISO date in its time zone. */
export function coopToday(now: Date, zone: string): string {
  return DateTime.fromJSDate(now, { zone }).toISODate()!;
}
