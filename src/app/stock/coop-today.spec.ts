import { coopToday } from './coop-today';

describe('coopToday', () => {
  it('when it is late evening in UTC, then the co-op in Auckland is already on the next day', () => {
    // 2026-12-02 20:30 UTC is 2026-12-03 09:30 in Pacific/Auckland (UTC+13 in December, NZ daylight time).
    expect(coopToday('Pacific/Auckland', new Date('2026-12-02T20:30:00Z'))).toBe('2026-12-03');
    expect(coopToday('Europe/Berlin', new Date('2026-12-02T20:30:00Z'))).toBe('2026-12-02');
  });

  it('when it is just after midnight in Berlin, then the co-op day is already the new one while UTC is still on the old', () => {
    // 23:30 UTC on 2 Dec is 00:30 on 3 Dec in Berlin (CET, UTC+1).
    expect(coopToday('Europe/Berlin', new Date('2026-12-02T23:30:00Z'))).toBe('2026-12-03');
  });
});
