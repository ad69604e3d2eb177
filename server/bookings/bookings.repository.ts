import { Knex } from 'knex';
import { Booking } from '@shared/bookings';
import { liveBookings, toBooking } from './booking-records.repository';

/** Reads of bookings: one, those held in a range, a day's reminders, a member's. */
export const bookingsRepository = {
  async findById(db: Knex, id: number): Promise<Booking | null> {
    const row = await liveBookings(db).where('bookings.id', id).first();
    return row ? toBooking(row) : null;
  },

  /** Bookings whose hold touches [from, to), oldest first. */
  async listHeldBetween(db: Knex, from: Date, to: Date, kitItemId?: number): Promise<Booking[]> {
    const query = liveBookings(db).where('bookings.starts_at', '<', to).where('bookings.held_until', '>', from).orderBy('bookings.starts_at');
    if (kitItemId) query.where('bookings.kit_item_id', kitItemId);
    return (await query).map(toBooking);
  },

  /** Members' bookings (not maintenance blocks) that start in [from, to): the reminders of a day. */
  async listUseStartingBetween(db: Knex, from: Date, to: Date): Promise<Booking[]> {
    const rows = await liveBookings(db).where('bookings.purpose', 'use').where('bookings.starts_at', '>=', from).where('bookings.starts_at', '<', to).orderBy('bookings.starts_at');
    return rows.map(toBooking);
  },

  /** How many of a member's bookings have not started yet. */
  async countUpcomingForUser(db: Knex, userId: number, now: Date): Promise<number> {
    const [row] = await db('bookings').where({ user_id: userId, purpose: 'use' }).whereNull('cancelled_at').where('starts_at', '>', now).count<{ n: number }[]>({ n: '*' });
    return Number(row.n);
  },

  /** A member's bookings not yet over, soonest first. */
  async listForUserEndingAfter(db: Knex, userId: number, after: Date): Promise<Booking[]> {
    const rows = await liveBookings(db).where('bookings.user_id', userId).where('bookings.ends_at', '>', after).orderBy('bookings.starts_at');
    return rows.map(toBooking);
  },
};
