import { Booking, BookingConflict } from '@shared/bookings';
import { DateTime } from 'luxon';
import { AppError } from '../errors/app-error';

const when = (iso: string, zone: string) => DateTime.fromISO(iso, { zone }).toFormat('ccc d LLL HH:mm');

/** The 409 for a request that runs into `existing`: the message and the details name that booking. */
export function bookingConflict(existing: Booking): AppError {
  const what = existing.purpose === 'maintenance' ? 'blocked for maintenance' : `booked by ${existing.userName}`;
  const message =
    `${existing.kitItemCode} is ${what} (booking #${existing.id}) from ${when(existing.startsAt, existing.timeZone)} ` +
    `until ${when(existing.endsAt, existing.timeZone)}, and held for cleaning until ${when(existing.heldUntil, existing.timeZone)}. ` +
    'Please choose other times or another item.';
  const conflict: BookingConflict = {
    kind: 'booking',
    id: existing.id,
    kitItemCode: existing.kitItemCode,
    userName: existing.userName,
    startsAt: existing.startsAt,
    heldUntil: existing.heldUntil,
  };
  return new AppError('booking-conflict', message, 409, undefined, undefined, { conflict });
}
