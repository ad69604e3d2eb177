import { DateTime } from 'luxon';
import { monthsEndingNow } from './report-range';

describe('monthsEndingNow', () => {
  it('ends with this month of the co-op’s zone, across a year end', () => {
    // 31 Dec 2026 23:30 UTC is already 1 Jan 2027 in Berlin (UTC+1).
    const now = DateTime.fromISO('2026-12-31T23:30:00Z');
    expect(monthsEndingNow(12, 'Europe/Berlin', now)).toEqual({ from: '2026-02', to: '2027-01' });
    expect(monthsEndingNow(6, 'UTC', now)).toEqual({ from: '2026-07', to: '2026-12' });
  });
});
