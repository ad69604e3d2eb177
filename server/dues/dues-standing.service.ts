import { Knex } from 'knex';
import { duesCoverDay } from '@shared/dues';
import { AppError } from '../errors/app-error';
import { coopToday } from './dues-clock';
import { duesRepository, isoDate } from './dues.repository';

/** Whether a person may make new bookings; when not, what to tell them (why, and how to pay). */
export type DuesStandingResult = { mayBook: true } | { mayBook: false; reason: string; howToPay: string };

/** The kit room asks this before every new booking; existing bookings never depend on it. */
export interface DuesStanding {
  standingOf(userId: number): Promise<DuesStandingResult>;
  /** Throws a 403 `dues-lapsed` that says why and how to pay, when the member's dues do not cover today. */
  assertMayBook(userId: number): Promise<void>;
}

const HOW_TO_PAY = 'Pay them on the Dues page (/dues), by card or in cash to an officer; bookings you already have stay.';

export function createDuesStanding(deps: { db: Knex; coopTimeZone: string; now?: () => Date }): DuesStanding {
  const now = deps.now ?? (() => new Date());
  async function standingOf(userId: number): Promise<DuesStandingResult> {
    const membership = await duesRepository.findMembership(deps.db, userId);
    const paidThrough = isoDate(membership?.paid_through ?? null);
    if (duesCoverDay(paidThrough, coopToday(now(), deps.coopTimeZone))) return { mayBook: true };
    const why = paidThrough ? `Your dues were paid through ${paidThrough}, so they have lapsed` : 'We have no dues payment from you yet';
    return { mayBook: false, reason: `${why}: new bookings need paid-up dues.`, howToPay: HOW_TO_PAY };
  }
  return {
    standingOf,
    async assertMayBook(userId) {
      const standing = await standingOf(userId);
      if (!standing.mayBook) throw new AppError('dues-lapsed', `${standing.reason} ${standing.howToPay}`, 403);
    },
  };
}
