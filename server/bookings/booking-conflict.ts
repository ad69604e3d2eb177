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

/** The 409 for a request on a fermenter that a fermenting or conditioning batch holds until it is packaged. */
export function batchHoldConflict(kitItemCode: string, batch: { id: number; name: string }): AppError {
  const conflict: BookingConflict = { kind: 'batch', id: batch.id, kitItemCode, batchName: batch.name };
  const message = `${kitItemCode} holds the batch "${batch.name}" (batch #${batch.id}) until it is packaged. Please choose another item.`;
  return new AppError('booking-conflict', message, 409, undefined, undefined, { conflict });
}
