import { DateTime } from 'luxon';

/** Today on the co-op's calendar, yyyy-MM-dd: the day a lot is received or a horizon starts. */
export function coopToday(zone: string, now = new Date()): string {
  return DateTime.fromJSDate(now, { zone }).toISODate() ?? DateTime.fromJSDate(now, { zone: 'utc' }).toISODate()!;
}
