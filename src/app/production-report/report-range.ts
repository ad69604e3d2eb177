import { DateTime } from 'luxon';

/** The `months` months ending with this month of `zone`, as yyyy-MM. */
export function monthsEndingNow(months: number, zone: string, now: DateTime = DateTime.now()): { from: string; to: string } {
  const thisMonth = now.setZone(zone).startOf('month');
  return { from: thisMonth.minus({ months: months - 1 }).toFormat('yyyy-MM'), to: thisMonth.toFormat('yyyy-MM') };
}
