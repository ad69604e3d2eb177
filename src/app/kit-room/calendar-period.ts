import { DateTime } from 'luxon';

/** How much of the calendar shows at once. */
export type CalendarView = 'week' | 'month';

/** The days a view shows around `anchor` (yyyy-MM-dd): a Monday-to-Sunday week, or the whole weeks covering a month. */
export function periodDays(view: CalendarView, anchor: string): string[] {
  const day = DateTime.fromISO(anchor);
  const first = view === 'week' ? day.startOf('week') : day.startOf('month').startOf('week');
  const last = view === 'week' ? day.endOf('week') : day.endOf('month').endOf('week');
  const days: string[] = [];
  for (let each = first; each <= last; each = each.plus({ days: 1 })) days.push(each.toISODate()!);
  return days;
}

/** The anchor one period earlier (-1) or later (+1). */
export function stepPeriod(view: CalendarView, anchor: string, step: -1 | 1): string {
  const day = DateTime.fromISO(anchor);
  return (view === 'week' ? day.plus({ weeks: step }) : day.plus({ months: step }).startOf('month')).toISODate()!;
}

/** A heading for the period, e.g. "7 – 13 Dec 2026" or "December 2026". */
export function periodTitle(view: CalendarView, anchor: string): string {
  const days = periodDays(view, anchor);
  if (view === 'month') return DateTime.fromISO(anchor).toFormat('LLLL yyyy');
  const first = DateTime.fromISO(days[0]);
  const last = DateTime.fromISO(days[days.length - 1]);
  return `${first.toFormat(first.month === last.month ? 'd' : 'd LLL')} – ${last.toFormat('d LLL yyyy')}`;
}
