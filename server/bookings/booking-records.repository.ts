import { Knex } from 'knex';
import { Booking, instantToWallClock } from '@shared/bookings';
import { BookingRow } from '../db';

// The booking as the API speaks of it, read from its row with the item's and the person's names.

type BookingRecord = BookingRow & { kit_item_code: string; kit_item_name: string; user_name: string };

export function toBooking(row: BookingRecord): Booking {
  return {
    id: row.id,
    kitItemId: row.kit_item_id,
    kitItemCode: row.kit_item_code,
    kitItemName: row.kit_item_name,
    userId: row.user_id,
    userName: row.user_name,
    purpose: row.purpose,
    startsAt: row.starts_at.toISOString(),
    endsAt: row.ends_at.toISOString(),
    heldUntil: row.held_until.toISOString(),
    startLocal: instantToWallClock(row.starts_at, row.time_zone),
    endLocal: instantToWallClock(row.ends_at, row.time_zone),
    timeZone: row.time_zone,
    batchId: row.batch_id,
    note: row.note,
    createdAt: row.created_at.toISOString(),
  };
}

/** Bookings not cancelled, each with its item's code and name and its person's name. */
export function liveBookings(db: Knex) {
  return db('bookings')
    .join('kit_items', 'kit_items.id', 'bookings.kit_item_id')
    .join('users', 'users.id', 'bookings.user_id')
    .whereNull('bookings.cancelled_at')
    .select('bookings.*', 'kit_items.code as kit_item_code', 'kit_items.name as kit_item_name', 'users.name as user_name');
}
