import ical from 'ical-generator';
import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BOOKINGS_PATH, BookingFeedLink, BookingFeedLinkStatus } from '@shared/bookings';
import { recordAudit } from '../audit/audit-log.repository';
import { createOneTimeToken, hashOneTimeToken } from '../auth/one-time-token';
import { AppError } from '../errors/app-error';
import { bookingsRepository } from './bookings.repository';
import { feedLinksRepository } from './feed-links.repository';

/** How far back the feed reaches, so a calendar app keeps recent history. */
const FEED_HISTORY_DAYS = 60;

/** Each person's bookings as an iCalendar feed behind a private, revocable link. */
export function createBookingFeedService(db: Knex, publicUrl: string) {
  return {
    async status(user: SessionUser): Promise<BookingFeedLinkStatus> {
      const link = await feedLinksRepository.findByUser(db, user.id);
      return { active: link !== null, issuedAt: link?.createdAt.toISOString() ?? null };
    },

    async issue(user: SessionUser): Promise<BookingFeedLink> {
      const { token, hash } = createOneTimeToken();
      await db.transaction(async (trx) => {
        await feedLinksRepository.replace(trx, user.id, hash);
        await recordAudit(trx, { actorUserId: user.id, action: 'booking-feed-issued', subjectType: 'user', subjectId: user.id });
      });
      const link = await feedLinksRepository.findByUser(db, user.id);
      return { url: `${publicUrl}${BOOKINGS_PATH}/feed/${token}`, issuedAt: link!.createdAt.toISOString() };
    },

    async revoke(user: SessionUser): Promise<void> {
      await db.transaction(async (trx) => {
        await feedLinksRepository.remove(trx, user.id);
        await recordAudit(trx, { actorUserId: user.id, action: 'booking-feed-revoked', subjectType: 'user', subjectId: user.id });
      });
    },

    /** The calendar text for a token; an unknown or revoked token is a 404 that tells nothing more. */
    async calendar(token: string): Promise<string> {
      const userId = await feedLinksRepository.userIdForHash(db, hashOneTimeToken(token));
      if (userId === null) throw new AppError('feed-not-found', 'This calendar link is not valid (it may have been replaced or revoked).', 404);
      const since = new Date(Date.now() - FEED_HISTORY_DAYS * 86_400_000);
      const bookings = await bookingsRepository.listForUserEndingAfter(db, userId, since);
      const calendar = ical({ name: 'Kit room bookings · Commonwort', prodId: { company: 'Commonwort', product: 'Kit room' } });
      for (const booking of bookings) {
        calendar.createEvent({
          id: `booking-${booking.id}@commonwort`,
          start: new Date(booking.startsAt),
          end: new Date(booking.endsAt),
          summary: `${booking.kitItemCode} ${booking.kitItemName}`,
          description: [`Held for cleaning until ${booking.heldUntil}.`, booking.note].filter(Boolean).join('\n'),
        });
      }
      return calendar.toString();
    },
  };
}

export type BookingFeedService = ReturnType<typeof createBookingFeedService>;
