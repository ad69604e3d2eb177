import { DateTime } from 'luxon';
import { DuesPeriod } from './dues-plan';

/** Where a member stands: paid up, paid up but ending soon, or lapsed. */
export const DUES_STATUSES = ['paid-up', 'due-soon', 'overdue'] as const;
export type DuesStatus = (typeof DUES_STATUSES)[number];

/** Days before the paid-through date from which dues count as "due soon". */
export const DUE_SOON_DAYS = 14;

const day = (iso: string) => DateTime.fromISO(iso, { zone: 'utc' });

/** The status on `today` (ISO dates in the co-op's zone); `paidThrough` is the last day covered, inclusive. */
export function duesStatus(paidThrough: string | null, today: string): DuesStatus {
  if (!paidThrough || paidThrough < today) return 'overdue';
  return day(paidThrough).diff(day(today), 'days').days < DUE_SOON_DAYS ? 'due-soon' : 'paid-up';
}

/** Whether a member may make new bookings: their dues cover today. */
export function duesCoverDay(paidThrough: string | null, today: string): boolean {
  return duesStatus(paidThrough, today) !== 'overdue';
}

/**
 * The period one more payment covers: it follows on from the paid-through date when that is still
 * running, and starts today when dues have lapsed (no back-pay for the gap).
 */
export function nextDuesPeriod(paidThrough: string | null, today: string, period: DuesPeriod): { start: string; end: string } {
  const start = paidThrough && paidThrough >= today ? day(paidThrough).plus({ days: 1 }) : day(today);
  const end = start.plus(period === 'month' ? { months: 1 } : { years: 1 }).minus({ days: 1 });
  return { start: start.toISODate()!, end: end.toISODate()! };
}
