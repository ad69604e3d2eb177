import { formatCalendarDay, ZonedDateTimePipe } from './zoned-date-time-pipe';

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

  // IANA tz database: America/New_York is UTC−5 in December, so 02:30 UTC is still the day before there.
  it('shows the wall-clock time there in numeric form, as the gravity log lists it', () => {
    expect(pipe.transform('2026-12-02T13:30:00.000Z', 'Europe/Berlin', 'numeric')).toBe('2026-12-02 14:30');
    expect(pipe.transform('2026-12-02T02:30:00Z', 'America/New_York', 'numeric')).toBe('2026-12-01 21:30');
  });

  it('shows a dash for a missing instant', () => {
    expect(pipe.transform(null, 'UTC')).toBe('—');
  });
});

describe('formatCalendarDay', () => {
  it('words a co-op calendar day as the pipe’s date form does', () => {
    expect(formatCalendarDay('2027-04-03')).toBe('3 Apr 2027');
  });
});
