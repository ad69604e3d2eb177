import { Pipe, PipeTransform } from '@angular/core';
import { DateTime } from 'luxon';

/** An instant (ISO text) as date and time in an IANA zone, with the zone's short name: "2 Dec 2026, 09:15 CET". */
@Pipe({ name: 'cwZonedDateTime' })
export class ZonedDateTimePipe implements PipeTransform {
  transform(instant: string | null | undefined, zone: string): string {
    if (!instant) return '—';
    const shown = DateTime.fromISO(instant, { zone: 'utc' }).setZone(zone);
    return shown.isValid ? shown.toFormat('d LLL yyyy, HH:mm ZZZZ', { locale: 'en-GB' }) : '—';
  }
}
