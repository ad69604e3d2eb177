import { daysFromCivil, epochSecondsOfDatetime } from './datetime-seconds';

describe('epochSecondsOfDatetime', () => {
  it('reads the database text of a DATETIME as seconds since 1970, UTC', () => {
    // POSIX.1-2017, Base Definitions 4.16 "Seconds Since the Epoch": 2000-01-01 00:00:00 UTC is 946,684,800 s
    // (10,957 days of 86,400 s).
    expect(epochSecondsOfDatetime('2000-01-01 00:00:00')).toBe(946_684_800);
    expect(epochSecondsOfDatetime('1970-01-01 00:00:00')).toBe(0);
    // The same formula: a leap day and the last second of a day, against ECMAScript's Date.UTC.
    expect(epochSecondsOfDatetime('2028-02-29 23:59:59')).toBe(Date.UTC(2028, 1, 29, 23, 59, 59) / 1000);
    expect(epochSecondsOfDatetime('2026-11-01 08:05:07')).toBe(Date.UTC(2026, 10, 1, 8, 5, 7) / 1000);
  });

  it('reads a value with fractions of a second, should a column ever keep them, as its whole second', () => {
    expect(epochSecondsOfDatetime('2026-11-01 08:05:07.250')).toBe(Date.UTC(2026, 10, 1, 8, 5, 7) / 1000);
  });
});

describe('daysFromCivil', () => {
  it('counts days from 1970-01-01 across century and leap-year rules, as ECMAScript Date does', () => {
    // Hinnant's days_from_civil: 2000-03-01 is day 11,017; checked here against Date.UTC over 1900–2100.
    for (let t = Date.UTC(1900, 0, 1); t <= Date.UTC(2100, 11, 31); t += 86_400_000) {
      const d = new Date(t);
      const days = daysFromCivil(d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate());
      if (days !== t / 86_400_000) throw new Error(`${d.toISOString()}: ${days}`);
    }
    expect(daysFromCivil(2000, 3, 1)).toBe(11_017);
  });
});
