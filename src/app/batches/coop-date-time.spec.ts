import { DateTime } from 'luxon';
import { coopInstant, coopPickerValues } from './coop-date-time';

describe('co-op date and time', () => {
  it('when 14:30 on 2 Dec is picked for a Berlin co-op, then the instant is 13:30 UTC (CET is UTC+1 in winter)', () => {
    const date = DateTime.fromObject({ year: 2026, month: 12, day: 2 });
    const time = DateTime.fromObject({ hour: 14, minute: 30 });
    expect(coopInstant(date, time, 'Europe/Berlin')).toBe('2026-12-02T13:30:00.000Z');
  });

  it('when an instant is shown, then the pickers read the co-op clock whatever the browser zone', () => {
    const { date, time } = coopPickerValues('2026-07-01T22:15:00Z', 'America/New_York');
    expect([date.year, date.month, date.day, time.hour, time.minute]).toEqual([2026, 7, 1, 18, 15]);
  });

  it('when picked values are turned back into an instant, then it round-trips', () => {
    const { date, time } = coopPickerValues('2026-03-29T01:30:00Z', 'Europe/Berlin');
    expect(coopInstant(date, time, 'Europe/Berlin')).toBe('2026-03-29T01:30:00.000Z');
  });
});
