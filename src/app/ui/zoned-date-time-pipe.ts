import { Pipe, PipeTransform } from '@angular/core';
import { DateTime } from 'luxon';

const FORMATS = { dateTime: 'd LLL yyyy, HH:mm ZZZZ', date: 'd LLL yyyy', numeric: 'yyyy-MM-dd HH:mm' } as const;
export type ZonedForm = keyof typeof FORMATS;

/** An instant (ISO text) in an IANA zone in one of the pipe's forms; a dash when missing or unreadable. */
export function formatZoned(instant: string | null | undefined, zone: string, show: ZonedForm = 'dateTime'): string {
  if (!instant) return '—';
  const shown = DateTime.fromISO(instant, { zone: 'utc' }).setZone(zone);
  return shown.isValid ? shown.toFormat(FORMATS[show], { locale: 'en-GB' }) : '—';
}

/** A calendar day already in the co-op's zone (yyyy-MM-dd) in the same words as the pipe's date form: "2 Dec 2026". */
export function formatCalendarDay(date: string): string {
  const day = DateTime.fromISO(date, { zone: 'utc' });
  return day.isValid ? day.toFormat(FORMATS.date, { locale: 'en-GB' }) : '—';
}

/**
 * An instant (ISO text) in an IANA zone: "2 Dec 2026, 09:15 CET", or with 'date' only the day there, "2 Dec 2026",
 * or with 'numeric' the wall-clock time there in the form a reading log uses, "2026-12-02 09:15".
 * The co-op's zone, not the browser's, decides which day and hour a record belongs to.
 */
@Pipe({ name: 'cwZonedDateTime' })
export class ZonedDateTimePipe implements PipeTransform {
  transform(instant: string | null | undefined, zone: string, show: ZonedForm = 'dateTime'): string {
    return formatZoned(instant, zone, show);
  }
}
