import { Knex } from 'knex';
import { Booking } from '@shared/bookings';
import { instantToWallClock } from '@shared/bookings';
import { BookingRow } from '../db';

type BookingRecord = BookingRow & { kit_item_code: string; kit_item_name: string; user_name: string };

function toBooking(row: BookingRecord): Booking {
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

function liveBookings(db: Knex) {
  return db('bookings')
    .join('kit_items', 'kit_items.id', 'bookings.kit_item_id')
    .join('users', 'users.id', 'bookings.user_id')
    .whereNull('bookings.cancelled_at')
    .select('bookings.*', 'kit_items.code as kit_item_code', 'kit_items.name as kit_item_name', 'users.name as user_name');
}

/** A new or moved reservation as stored. */
export interface BookingWrite {
  kitItemId: number;
  userId: number;
  createdByUserId: number;
  purpose: Booking['purpose'];
  startsAt: Date;
  endsAt: Date;
  heldUntil: Date;
  timeZone: string;
  note: string;
  batchId: number | null;
}

/** Data access for bookings. */
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

  async listForUserEndingAfter(db: Knex, userId: number, after: Date): Promise<Booking[]> {
    const rows = await liveBookings(db).where('bookings.user_id', userId).where('bookings.ends_at', '>', after).orderBy('bookings.starts_at');
    return rows.map(toBooking);
  },

  /**
   * The first live booking of the item whose hold overlaps [start, heldUntil). A locking read, so
   * it sees what other transactions have committed since this one began.
   */
  async firstOverlap(trx: Knex.Transaction, kitItemId: number, start: Date, heldUntil: Date, exceptId?: number): Promise<Booking | null> {
    const query = liveBookings(trx)
      .where('bookings.kit_item_id', kitItemId)
      .where('bookings.starts_at', '<', heldUntil)
      .where('bookings.held_until', '>', start)
      .orderBy('bookings.starts_at')
      .forShare();
    if (exceptId) query.whereNot('bookings.id', exceptId);
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

  async moveTimes(trx: Knex.Transaction, id: number, times: { startsAt: Date; endsAt: Date; heldUntil: Date; timeZone: string }): Promise<void> {
    await trx('bookings').where({ id }).update({
      starts_at: times.startsAt,
      ends_at: times.endsAt,
      held_until: times.heldUntil,
      time_zone: times.timeZone,
      updated_at: new Date(),
    });
  },

  /** Puts a booking on another item and times (a planned batch moved on the brew plan). */
  async reassign(trx: Knex.Transaction, id: number, to: { kitItemId: number; startsAt: Date; endsAt: Date; heldUntil: Date; timeZone: string }): Promise<void> {
    await trx('bookings').where({ id }).update({
      kit_item_id: to.kitItemId,
      starts_at: to.startsAt,
      ends_at: to.endsAt,
      held_until: to.heldUntil,
      time_zone: to.timeZone,
      updated_at: new Date(),
    });
  },

  async cancel(db: Knex, id: number, byUserId: number): Promise<void> {
    await db('bookings').where({ id }).whereNull('cancelled_at').update({ cancelled_at: new Date(), cancelled_by_user_id: byUserId, updated_at: new Date() });
  },
};
