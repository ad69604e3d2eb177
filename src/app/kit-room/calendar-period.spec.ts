import { periodDays, periodTitle, stepPeriod } from './calendar-period';

// Calendar facts of 2026 (ISO 8601 weeks start on Monday): 1 December 2026 is a Tuesday.
describe('calendar period', () => {
  it('gives the Monday-to-Sunday week around a day', () => {
    expect(periodDays('week', '2026-12-02')).toEqual(['2026-11-30', '2026-12-01', '2026-12-02', '2026-12-03', '2026-12-04', '2026-12-05', '2026-12-06']);
  });

  it('gives whole weeks covering a month', () => {
    const days = periodDays('month', '2026-12-15');
    expect(days[0]).toBe('2026-11-30');
    expect(days[days.length - 1]).toBe('2027-01-03');
    expect(days.length % 7).toBe(0);
  });

  it('steps by a week or to the first of the next month, and titles the period', () => {
    expect(stepPeriod('week', '2026-12-02', 1)).toBe('2026-12-09');
    expect(stepPeriod('month', '2026-12-15', -1)).toBe('2026-11-01');
    expect(periodTitle('week', '2026-12-02')).toBe('30 Nov – 6 Dec 2026');
    expect(periodTitle('month', '2026-12-02')).toBe('December 2026');
  });
});
