import { DateTime } from 'luxon';

/** Wall-clock time as the co-op writes it: yyyy-MM-ddTHH:mm, no zone. */
export const WALL_CLOCK_PATTERN = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** Why a wall-clock time cannot be placed on the time line. */
export type WallClockProblem = 'malformed' | 'does-not-exist';

/**
 * The instant a wall-clock time names in `zone`. Each end of a booking is converted on its own, so a
 * booking across a daylight-saving change keeps the times the member chose. A time skipped when the
 * clocks go forward does not exist and is refused rather than shifted; a repeated time (clocks going
 * back) is read as standard time, luxon's choice.
 */
export function wallClockToInstant(local: string, zone: string): DateTime<true> | WallClockProblem {
  if (!WALL_CLOCK_PATTERN.test(local)) return 'malformed';
  const parsed = DateTime.fromISO(local, { zone });
  if (!parsed.isValid) return 'malformed';
  if (parsed.toFormat("yyyy-MM-dd'T'HH:mm") !== local) return 'does-not-exist';
  return parsed;
}

/** The wall-clock time of an instant in `zone`, in the same form. */
export function instantToWallClock(instant: Date | string, zone: string): string {
  const dt = typeof instant === 'string' ? DateTime.fromISO(instant, { zone: 'utc' }) : DateTime.fromJSDate(instant);
  return dt.setZone(zone).toFormat("yyyy-MM-dd'T'HH:mm");
}
