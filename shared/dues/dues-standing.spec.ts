import { duesCoverDay, duesStatus, nextDuesPeriod } from './dues-standing';

// Calendar arithmetic follows the ISO 8601 Gregorian calendar (month lengths, leap years); the
// due-soon window and "no back-pay after a lapse" are the co-op's own rules (common practice for clubs).
describe('dues standing', () => {
  it('duesStatus: paid through a date at least 14 days ahead is paid up', () => {
    expect(duesStatus('2026-12-31', '2026-12-02')).toBe('paid-up');
  });

  it('duesStatus: fewer than 14 days left is due soon, the last covered day included', () => {
    expect(duesStatus('2026-12-15', '2026-12-02')).toBe('due-soon');
    expect(duesStatus('2026-12-02', '2026-12-02')).toBe('due-soon');
  });

  it('duesStatus: a date before today, or none, is overdue', () => {
    expect(duesStatus('2026-12-01', '2026-12-02')).toBe('overdue');
    expect(duesStatus(null, '2026-12-02')).toBe('overdue');
  });

  it('duesCoverDay: dues cover the day up to and including the paid-through date', () => {
    expect(duesCoverDay('2026-12-02', '2026-12-02')).toBe(true);
    expect(duesCoverDay('2026-12-01', '2026-12-02')).toBe(false);
  });

  it('nextDuesPeriod: a running membership continues the day after the paid-through date', () => {
    expect(nextDuesPeriod('2026-12-20', '2026-12-02', 'month')).toEqual({ start: '2026-12-21', end: '2027-01-20' });
  });

  it('nextDuesPeriod: a lapsed or new membership starts today, with no back-pay for the gap', () => {
    expect(nextDuesPeriod('2026-10-01', '2026-12-02', 'month')).toEqual({ start: '2026-12-02', end: '2027-01-01' });
    expect(nextDuesPeriod(null, '2026-12-02', 'year')).toEqual({ start: '2026-12-02', end: '2027-12-01' });
  });

  it('nextDuesPeriod: a month from 31 January ends on the last day of February (leap year 2028)', () => {
    expect(nextDuesPeriod(null, '2028-01-31', 'month')).toEqual({ start: '2028-01-31', end: '2028-02-28' });
  });
});
