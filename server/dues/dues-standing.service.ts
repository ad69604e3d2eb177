import { Knex } from 'knex';
import { duesCoverDay } from '@shared/dues';
import { AppError } from '../errors/app-error';
import { coopToday } from './dues-clock';
import { duesRepository, isoDate } from './dues.repository';

/** Whether a member's dues let them make new bookings; the kit room asks this before every new booking. */
export interface DuesStanding {
  /** Throws a 403 `dues-lapsed` that says why and how to pay, when the member's dues do not cover today. */
  assertMayBook(userId: number): Promise<void>;
}

export function createDuesStanding(deps: { db: Knex; coopTimeZone: string; now?: () => Date }): DuesStanding {
  const now = deps.now ?? (() => new Date());
  return {
    async assertMayBook(userId) {
      const membership = await duesRepository.findMembership(deps.db, userId);
      const paidThrough = isoDate(membership?.paid_through ?? null);
      if (duesCoverDay(paidThrough, coopToday(now(), deps.coopTimeZone))) return;
      const why = paidThrough ? `Your dues were paid through ${paidThrough}, so they have lapsed` : 'We have no dues payment from you yet';
      throw new AppError('dues-lapsed', `${why}: new bookings need paid-up dues. Pay them on the Dues page (/dues), by card or in cash to an officer; bookings you already have stay.`, 403);
    },
  };
}
