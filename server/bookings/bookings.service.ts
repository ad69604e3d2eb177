import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { Booking, CreateBookingRequest, heldUntil, MoveBookingRequest } from '@shared/bookings';
import { recordAudit } from '../audit/audit-log.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { AppError, forbidden } from '../errors/app-error';
import { assertItemFree, lockBookableItem } from './booking-holds';
import { bookedFor, linkedBatch } from './booking-party';
import { BookingNotices } from './booking-notices';
import { bookingTimes, calendarRange } from './booking-times';
import { bookingWritesRepository } from './booking-writes.repository';
import { bookingsRepository } from './bookings.repository';
import { DuesStanding, everyoneMayBook } from './dues-standing';

export interface BookingsServiceDeps {
  db: Knex;
  coopTimeZone: string;
  /** Whether dues allow a person new bookings; everyone until dues are kept. */
  duesStanding?: DuesStanding;
  /** Confirmation e-mails, queued with the booking. */
  notices?: Pick<BookingNotices, 'bookingMade'>;
}

const bookingNotFound = () => new AppError('booking-not-found', 'No booking has this id.', 404);
const isAdmin = (user: SessionUser) => user.roles.includes('admin');

/** Kit bookings: one item never has two holds at once, decided under the item's row lock. */
export function createBookingsService({ db, coopTimeZone, duesStanding = everyoneMayBook, notices }: BookingsServiceDeps) {
  /** New bookings need dues in order; existing ones stay whatever happens to dues. */
  async function assertMayBook(userId: number): Promise<void> {
    const standing = await duesStanding(userId);
    if (!standing.mayBook) throw new AppError('dues-lapsed', `${standing.reason} ${standing.howToPay}`, 403);
  }

  async function get(id: number): Promise<Booking> {
    const booking = await bookingsRepository.findById(db, id);
    if (!booking) throw bookingNotFound();
    return booking;
  }

  return {
    assertMayBook,
    get,

    listHeldBetween(from: string, to: string, kitItemId?: number): Promise<Booking[]> {
      const range = calendarRange(from, to, coopTimeZone);
      return bookingsRepository.listHeldBetween(db, range.from, range.to, kitItemId);
    },

    mine(user: SessionUser): Promise<Booking[]> {
      return bookingsRepository.listForUserEndingAfter(db, user.id, new Date());
    },

    async create(user: SessionUser, request: CreateBookingRequest): Promise<Booking> {
      const purpose = request.purpose ?? 'use';
      if (purpose === 'maintenance' && !isAdmin(user)) throw forbidden('Only an admin may block an item for maintenance.');
      const { startsAt, endsAt } = bookingTimes(request.start, request.end, coopTimeZone);
      const userId = await bookedFor(db, user, request);
      const batchId = await linkedBatch(db, userId, request.batchId);
      if (purpose === 'use') await assertMayBook(userId);
      const id = await transactionWithRetry(db, async (trx) => {
        const item = await lockBookableItem(trx, request.kitItemId, purpose);
        // A maintenance block needs no cleaning after it.
        const until = heldUntil(endsAt, purpose === 'use' ? item.turnaroundHours : 0);
        await assertItemFree(trx, item, startsAt, until, { batchId });
        const newId = await bookingWritesRepository.insert(trx, {
          kitItemId: item.id,
          userId,
          createdByUserId: user.id,
          purpose,
          startsAt,
          endsAt,
          heldUntil: until,
          timeZone: coopTimeZone,
          note: request.note ?? '',
          batchId,
        });
        await recordAudit(trx, { actorUserId: user.id, action: 'booking-created', subjectType: 'booking', subjectId: newId, detail: { kitItemId: request.kitItemId, userId, purpose } });
        await notices?.bookingMade(trx, newId);
        return newId;
      });
      return get(id);
    },

    /** Admins move a booking; it keeps the turnaround it was made with. */
    async move(user: SessionUser, id: number, request: MoveBookingRequest): Promise<Booking> {
      const existing = await get(id);
      const { startsAt, endsAt } = bookingTimes(request.start, request.end, coopTimeZone);
      const turnaroundMs = Date.parse(existing.heldUntil) - Date.parse(existing.endsAt);
      const until = new Date(endsAt.getTime() + turnaroundMs);
      await transactionWithRetry(db, async (trx) => {
        const item = await lockBookableItem(trx, existing.kitItemId, existing.purpose);
        await assertItemFree(trx, item, startsAt, until, { exceptBookingId: id, batchId: existing.batchId });
        await bookingWritesRepository.moveTimes(trx, id, { startsAt, endsAt, heldUntil: until, timeZone: coopTimeZone });
        await recordAudit(trx, { actorUserId: user.id, action: 'booking-moved', subjectType: 'booking', subjectId: id, detail: { from: existing.startsAt, to: startsAt.toISOString() } });
      });
      return get(id);
    },

    /** Members cancel their own bookings, admins any; a booking that has ended stays on record. */
    async cancel(user: SessionUser, id: number): Promise<void> {
      const existing = await get(id);
      if (existing.userId !== user.id && !isAdmin(user)) throw forbidden('Only the member who booked, or an admin, may cancel this booking.');
      if (Date.parse(existing.endsAt) <= Date.now()) throw new AppError('booking-ended', 'This booking has ended and stays on record.', 409);
      await db.transaction(async (trx) => {
        await bookingWritesRepository.cancel(trx, id, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'booking-cancelled', subjectType: 'booking', subjectId: id });
      });
    },
  };
}

export type BookingsService = ReturnType<typeof createBookingsService>;
