import { DateTime } from 'luxon';

/**
 * The instant (ISO, UTC) of a date and a time of day as read on the co-op's clocks. The pickers
 * give DateTimes in the browser's zone; only their calendar and clock fields are taken.
 */
export function coopInstant(date: DateTime, time: DateTime, zone: string): string | null {
  const local = DateTime.fromObject({ year: date.year, month: date.month, day: date.day, hour: time.hour, minute: time.minute }, { zone });
  return local.isValid ? local.toUTC().toISO() : null;
}

/** Picker values (browser zone) showing the co-op's wall-clock date and time of an instant. */
export function coopPickerValues(iso: string, zone: string): { date: DateTime; time: DateTime } {
  const there = DateTime.fromISO(iso, { zone });
  const here = DateTime.fromObject({ year: there.year, month: there.month, day: there.day, hour: there.hour, minute: there.minute });
  return { date: here.startOf('day'), time: here };
}

/** Now, as picker values on the co-op's clocks. */
export function coopNowPickerValues(zone: string): { date: DateTime; time: DateTime } {
  return coopPickerValues(DateTime.utc().toISO()!, zone);
}
