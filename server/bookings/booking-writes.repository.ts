import { Knex } from 'knex';
import { Booking } from '@shared/bookings';

/** The times of a booking as stored: its wall-clock zone is kept beside the instants. */
interface BookingTimes {
  startsAt: Date;
  endsAt: Date;
  heldUntil: Date;
  timeZone: string;
}

/** A new reservation as stored. */
export interface BookingWrite extends BookingTimes {
  kitItemId: number;
  userId: number;
  createdByUserId: number;
  purpose: Booking['purpose'];
  note: string;
  batchId: number | null;
}

const timeColumns = (times: BookingTimes) => ({
  starts_at: times.startsAt,
  ends_at: times.endsAt,
  held_until: times.heldUntil,
  time_zone: times.timeZone,
  updated_at: new Date(),
});

/** Writes of bookings; those that go with an audit entry take its transaction. */
export const bookingWritesRepository = {
  async insert(trx: Knex.Transaction, booking: BookingWrite): Promise<number> {
    const [id] = await trx('bookings').insert({
      kit_item_id: booking.kitItemId,
      user_id: booking.userId,
      created_by_user_id: booking.createdByUserId,
      purpose: booking.purpose,
      starts_at: booking.startsAt,
      ends_at: booking.endsAt,
      held_until: booking.heldUntil,
      time_zone: booking.timeZone,
      batch_id: booking.batchId,
      note: booking.note,
    });
    return id;
  },

  async moveTimes(trx: Knex.Transaction, id: number, times: BookingTimes): Promise<void> {
    await trx('bookings').where({ id }).update(timeColumns(times));
  },

  /** Puts a booking on another item and times (a planned batch moved on the brew plan). */
  async reassign(trx: Knex.Transaction, id: number, to: BookingTimes & { kitItemId: number }): Promise<void> {
    await trx('bookings').where({ id }).update({ kit_item_id: to.kitItemId, ...timeColumns(to) });
  },

  async cancel(db: Knex, id: number, byUserId: number): Promise<void> {
    await db('bookings').where({ id }).whereNull('cancelled_at').update({ cancelled_at: new Date(), cancelled_by_user_id: byUserId, updated_at: new Date() });
  },
};
