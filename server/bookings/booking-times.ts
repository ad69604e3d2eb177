import { DateTime } from 'luxon';
import { BOOKING_LIMITS, wallClockToInstant } from '@shared/bookings';
import { AppError } from '../errors/app-error';

/** A booking's ends placed on the time line. */
export interface BookingTimes {
  startsAt: Date;
  endsAt: Date;
}

/** A start a few minutes back is still "now": the form may have been open a while. */
const PAST_GRACE_MINUTES = 15;

function refuse(field: string, reason: string): never {
  throw new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: reason });
}

function place(local: string, zone: string, field: string): DateTime<true> {
  const instant = wallClockToInstant(local, zone);
  if (instant === 'malformed') refuse(field, 'must be a date and time as yyyy-MM-ddTHH:mm');
  if (instant === 'does-not-exist') refuse(field, `does not exist in ${zone}: the clocks skip it that night`);
  return instant;
}

/**
 * The instants of a booking entered as wall-clock times in the co-op's zone, checked against the
 * booking limits; each refusal is a 400 naming the field.
 */
export function bookingTimes(start: string, end: string, zone: string, now: DateTime = DateTime.utc()): BookingTimes {
  const startsAt = place(start, zone, 'start');
  const endsAt = place(end, zone, 'end');
  const minutes = endsAt.diff(startsAt, 'minutes').minutes;
  if (minutes < BOOKING_LIMITS.minDurationMinutes) refuse('end', `must be at least ${BOOKING_LIMITS.minDurationMinutes} minutes after the start`);
  if (minutes > BOOKING_LIMITS.maxDurationDays * 24 * 60) refuse('end', `must be at most ${BOOKING_LIMITS.maxDurationDays} days after the start`);
  if (startsAt < now.minus({ minutes: PAST_GRACE_MINUTES })) refuse('start', 'is in the past');
  if (startsAt > now.plus({ days: BOOKING_LIMITS.maxDaysAhead })) refuse('start', `must be within ${BOOKING_LIMITS.maxDaysAhead} days from today`);
  return { startsAt: startsAt.toJSDate(), endsAt: endsAt.toJSDate() };
}

/** The instants bounding whole calendar days [from, to] (yyyy-MM-dd, inclusive) in `zone`. */
export function calendarRange(from: string, to: string, zone: string): { from: Date; to: Date } {
  const start = DateTime.fromISO(from, { zone }).startOf('day');
  const end = DateTime.fromISO(to, { zone }).plus({ days: 1 }).startOf('day');
  if (!start.isValid) refuse('from', 'must be a date as yyyy-MM-dd');
  if (!end.isValid) refuse('to', 'must be a date as yyyy-MM-dd');
  const days = end.diff(start, 'days').days;
  if (days <= 0) refuse('to', 'must not be before from');
  if (days > BOOKING_LIMITS.maxRangeDays) refuse('to', `must be at most ${BOOKING_LIMITS.maxRangeDays} days after from`);
  return { from: start.toJSDate(), to: end.toJSDate() };
}
