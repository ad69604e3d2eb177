import { AbstractControl, ValidationErrors } from '@angular/forms';
import { DateTime } from 'luxon';

/** A picked calendar day and a typed time, as the wall-clock text the API takes (yyyy-MM-ddTHH:mm). */
export function wallClockOf(day: DateTime | null, time: string): string | null {
  if (!day || !day.isValid || !/^\d{2}:\d{2}$/.test(time)) return null;
  return `${day.toFormat('yyyy-MM-dd')}T${time}`;
}

/** The end must come after the start; wall-clock text compares in order. */
export function endAfterStart(group: AbstractControl): ValidationErrors | null {
  const value = group.value as { startDate: DateTime | null; startTime: string; endDate: DateTime | null; endTime: string };
  const start = wallClockOf(value.startDate, value.startTime);
  const end = wallClockOf(value.endDate, value.endTime);
  return start && end && end <= start ? { endBeforeStart: true } : null;
}

/** Wall-clock text (yyyy-MM-ddTHH:mm) split into the day the date picker shows and the typed time. */
export function wallClockParts(local: string): { date: DateTime | null; time: string } {
  const date = DateTime.fromISO(local.slice(0, 10));
  return { date: date.isValid ? date : null, time: local.slice(11, 16) };
}
