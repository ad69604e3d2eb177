import { DateTime } from 'luxon';
import { AppError } from '../errors/app-error';
import { bookingTimes, calendarRange } from './booking-times';

const now = DateTime.fromISO('2026-12-02T12:00:00Z');
const fieldsOf = (work: () => unknown) => {
  try {
    work();
  } catch (error) {
    return (error as AppError).fields;
  }
  throw new Error('expected a refusal');
};

describe('bookingTimes', () => {
  it('places both ends in the co-op zone (Berlin is UTC+1 in December, Directive 2000/84/EC)', () => {
    const times = bookingTimes('2026-12-09T10:00', '2026-12-11T10:00', 'Europe/Berlin', now);
    expect(times.startsAt.toISOString()).toBe('2026-12-09T09:00:00.000Z');
    expect(times.endsAt.toISOString()).toBe('2026-12-11T09:00:00.000Z');
  });

  it('names the field for a skipped time, a too-short booking and one too far ahead', () => {
    expect(fieldsOf(() => bookingTimes('2027-03-28T02:30', '2027-03-29T10:00', 'Europe/Berlin', now))).toHaveProperty('start');
    expect(fieldsOf(() => bookingTimes('2026-12-09T10:00', '2026-12-09T10:15', 'Europe/Berlin', now))).toHaveProperty('end');
    expect(fieldsOf(() => bookingTimes('2028-01-09T10:00', '2028-01-10T10:00', 'Europe/Berlin', now))).toHaveProperty('start');
  });
});

describe('calendarRange', () => {
  it('covers whole days in the zone, the last one included', () => {
    const range = calendarRange('2026-12-07', '2026-12-13', 'Europe/Berlin');
    expect(range.from.toISOString()).toBe('2026-12-06T23:00:00.000Z');
    expect(range.to.toISOString()).toBe('2026-12-13T23:00:00.000Z');
  });
});
