import { Pipe, PipeTransform } from '@angular/core';
import { DateTime } from 'luxon';

/** An ISO instant as wall-clock time in the co-op's zone, e.g. "2026-12-02 14:30". */
@Pipe({ name: 'coopTime' })
export class CoopTimePipe implements PipeTransform {
  transform(iso: string, zone: string): string {
    return DateTime.fromISO(iso, { zone }).toFormat('yyyy-MM-dd HH:mm');
  }
}
