import { Pipe, PipeTransform } from '@angular/core';
import { DateTime } from 'luxon';

const FORMATS = { dateTime: 'd LLL yyyy, HH:mm ZZZZ', date: 'd LLL yyyy', numeric: 'yyyy-MM-dd HH:mm' } as const;

/**
 * An instant (ISO text) in an IANA zone: "2 Dec 2026, 09:15 CET", or with 'date' only the day there, "2 Dec 2026",
 * or with 'numeric' the wall-clock time there in the form a reading log uses, "2026-12-02 09:15".
 * The co-op's zone, not the browser's, decides which day and hour a record belongs to.
 */
@Pipe({ name: 'cwZonedDateTime' })
export class ZonedDateTimePipe implements PipeTransform {
  transform(instant: string | null | undefined, zone: string, show: keyof typeof FORMATS = 'dateTime'): string {
    if (!instant) return '—';
    const shown = DateTime.fromISO(instant, { zone: 'utc' }).setZone(zone);
    return shown.isValid ? shown.toFormat(FORMATS[show], { locale: 'en-GB' }) : '—';
  }
}
