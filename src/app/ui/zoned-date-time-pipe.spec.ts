import { ZonedDateTimePipe } from './zoned-date-time-pipe';

describe('ZonedDateTimePipe', () => {
  const pipe = new ZonedDateTimePipe();

  // IANA tz database: Europe/Berlin is UTC+1 in December (CET) and UTC+2 in July (CEST).
  it('shows an instant in the co-op zone with its short name, winter and summer', () => {
    expect(pipe.transform('2026-12-02T08:15:00.000Z', 'Europe/Berlin')).toBe('2 Dec 2026, 09:15 CET');
    expect(pipe.transform('2026-07-02T08:15:00.000Z', 'Europe/Berlin')).toBe('2 Jul 2026, 10:15 CEST');
  });

  // IANA tz database: Pacific/Auckland is UTC+13 in December, so 20:30 UTC is already the next day there.
  it('shows only the co-op day when asked for the date', () => {
    expect(pipe.transform('2026-12-02T20:30:00.000Z', 'Pacific/Auckland', 'date')).toBe('3 Dec 2026');
  });

  it('shows a dash for a missing instant', () => {
    expect(pipe.transform(null, 'UTC')).toBe('—');
  });
});
