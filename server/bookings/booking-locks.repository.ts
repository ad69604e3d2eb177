import { Knex } from 'knex';
import { Booking } from '@shared/bookings';
import { liveBookings, toBooking } from './booking-records.repository';

/**
 * The locking reads a write checks an item's holds with, inside its transaction: they see what
 * other transactions have committed since this one began, and hold those rows until it ends.
 */
export const bookingLocksRepository = {
  /** The first live booking of the item whose hold overlaps [start, heldUntil), other than `exceptId` and those serving `exceptBatchId`. */
  async firstOverlap(trx: Knex.Transaction, kitItemId: number, start: Date, heldUntil: Date, exceptId?: number, exceptBatchId?: number): Promise<Booking | null> {
    const query = liveBookings(trx)
      .where('bookings.kit_item_id', kitItemId)
      .where('bookings.starts_at', '<', heldUntil)
      .where('bookings.held_until', '>', start)
      .orderBy('bookings.starts_at')
      .forShare();
    if (exceptId) query.whereNot('bookings.id', exceptId);
    if (exceptBatchId) query.where((q) => q.whereNull('bookings.batch_id').orWhereNot('bookings.batch_id', exceptBatchId));
    const row = await query.first();
    return row ? toBooking(row) : null;
  },

  /**
   * The first live booking of the item still held at or after `from`, other than those serving
   * `exceptBatchId`: what a batch that starts holding the fermenter at `from` would run into.
   */
  async firstHeldFrom(trx: Knex.Transaction, kitItemId: number, from: Date, exceptBatchId: number): Promise<Booking | null> {
    const row = await liveBookings(trx)
      .where('bookings.kit_item_id', kitItemId)
      .where('bookings.held_until', '>', from)
      .where((q) => q.whereNull('bookings.batch_id').orWhereNot('bookings.batch_id', exceptBatchId))
      .orderBy('bookings.starts_at')
      .forShare()
      .first();
    return row ? toBooking(row) : null;
  },
};
