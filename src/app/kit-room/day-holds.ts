import { DateTime } from 'luxon';
import { Booking } from '@shared/bookings';

/** One booking as it shows on one calendar day. */
export interface DayHold {
  booking: Booking;
  /** e.g. "F2 · Priya Raman · from 10:00". */
  label: string;
  /** True when only the cleaning turnaround falls on this day. */
  cleaningOnly: boolean;
}

const time = (dt: DateTime) => dt.toFormat('HH:mm');

/** The bookings that hold an item on `day` (yyyy-MM-dd in `zone`), with what to show for each. */
export function holdsOnDay(bookings: readonly Booking[], day: string, zone: string): DayHold[] {
  const dayStart = DateTime.fromISO(day, { zone }).startOf('day');
  const dayEnd = dayStart.plus({ days: 1 });
  const holds: DayHold[] = [];
  for (const booking of bookings) {
    const start = DateTime.fromISO(booking.startsAt, { zone });
    const end = DateTime.fromISO(booking.endsAt, { zone });
    const held = DateTime.fromISO(booking.heldUntil, { zone });
    if (!(start < dayEnd && held > dayStart)) continue;
    const who = booking.purpose === 'maintenance' ? 'maintenance' : booking.userName;
    const cleaningOnly = end <= dayStart;
    let when = 'all day';
    if (cleaningOnly) when = `cleaning until ${held < dayEnd ? time(held) : 'end of day'}`;
    else if (start >= dayStart && end <= dayEnd) when = `${time(start)}–${time(end)}`;
    else if (start >= dayStart) when = `from ${time(start)}`;
    else if (end <= dayEnd) when = `until ${time(end)}`;
    holds.push({ booking, label: `${booking.kitItemCode} · ${who} · ${when}`, cleaningOnly });
  }
  return holds;
}
