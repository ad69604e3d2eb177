import { Knex } from 'knex';
import { DateTime } from 'luxon';
import { Booking } from '@shared/bookings';
import { outboxRepository } from '../mail/outbox.repository';
import { BookingFacts, bookingConfirmationMail, bookingReminderMail } from '../mail/templates/booking-mails';
import { usersRepository } from '../users/users.repository';
import { bookingsRepository } from './bookings.repository';

/** The e-mails of the kit room: a confirmation with each booking, a reminder the day before. */
export interface BookingNotices {
  /** Queues the confirmation in the booking's own transaction. */
  bookingMade(trx: Knex.Transaction, bookingId: number): Promise<void>;
  /** Queues a reminder for each booking that starts tomorrow (co-op time); once per booking and start. */
  remindTomorrow(): Promise<number>;
}

function factsOf(booking: Booking, memberName: string): BookingFacts {
  return {
    memberName,
    itemCode: booking.kitItemCode,
    itemName: booking.kitItemName,
    startLocal: booking.startLocal,
    endLocal: booking.endLocal,
    timeZone: booking.timeZone,
    turnaroundHours: Math.round((Date.parse(booking.heldUntil) - Date.parse(booking.endsAt)) / 36e5),
  };
}

export function createBookingNotices(deps: { db: Knex; coopTimeZone: string; publicUrl: string; now?: () => Date }): BookingNotices {
  const now = deps.now ?? (() => new Date());
  const bookingsUrl = `${deps.publicUrl}/kit-room`;

  async function enqueueFor(db: Knex, booking: Booking, kind: 'booking-confirmation' | 'booking-reminder', dedupeKey: string): Promise<boolean> {
    const member = await usersRepository.findById(db, booking.userId);
    if (!member?.active) return false;
    const facts = factsOf(booking, member.name);
    const content = kind === 'booking-confirmation' ? bookingConfirmationMail(facts, bookingsUrl) : bookingReminderMail(facts, bookingsUrl);
    await outboxRepository.enqueue(db, { kind, to: member.email, dedupeKey, ...content });
    return true;
  }

  return {
    async bookingMade(trx, bookingId) {
      const booking = await bookingsRepository.findById(trx, bookingId);
      if (booking?.purpose === 'use') await enqueueFor(trx, booking, 'booking-confirmation', `booking-confirmation:${bookingId}`);
    },

    async remindTomorrow() {
      const tomorrow = DateTime.fromJSDate(now(), { zone: deps.coopTimeZone }).plus({ days: 1 }).startOf('day');
      const bookings = await bookingsRepository.listUseStartingBetween(deps.db, tomorrow.toJSDate(), tomorrow.plus({ days: 1 }).toJSDate());
      let queued = 0;
      // A moved booking starts at another time and gets a reminder of its own.
      for (const booking of bookings) if (await enqueueFor(deps.db, booking, 'booking-reminder', `booking-reminder:${booking.id}:${booking.startsAt}`)) queued++;
      return queued;
    },
  };
}
