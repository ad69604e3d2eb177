import { DateTime } from 'luxon';

/** One calendar month of the co-op's zone on the time line; end exclusive. */
export interface MonthWindow {
  month: string;
  start: number;
  end: number;
}

/** The months from `from` to `to` (yyyy-MM, both included) in `zone`. */
export function monthWindows(from: string, to: string, zone: string): MonthWindow[] {
  const windows: MonthWindow[] = [];
  let month = DateTime.fromFormat(from, 'yyyy-MM', { zone }).startOf('month');
  const last = DateTime.fromFormat(to, 'yyyy-MM', { zone }).startOf('month');
  while (month.isValid && month <= last) {
    const next = month.plus({ months: 1 });
    windows.push({ month: month.toFormat('yyyy-MM'), start: month.toMillis(), end: next.toMillis() });
    month = next;
  }
  return windows;
}

/** How many months `from` to `to` covers (both included); 0 or less when `to` comes first. */
export function monthsBetween(from: string, to: string): number {
  const [fy, fm] = from.split('-').map(Number);
  const [ty, tm] = to.split('-').map(Number);
  return (ty - fy) * 12 + (tm - fm) + 1;
}
