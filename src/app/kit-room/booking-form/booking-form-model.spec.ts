import { FormControl, FormGroup } from '@angular/forms';
import { DateTime } from 'luxon';
import { endAfterStart, wallClockOf, wallClockParts } from './booking-form-model';

describe('booking form model', () => {
  it('joins a picked day and a typed time into wall-clock text', () => {
    expect(wallClockOf(DateTime.fromISO('2026-12-09'), '10:00')).toBe('2026-12-09T10:00');
    expect(wallClockOf(null, '10:00')).toBeNull();
  });

  it('flags an end that is not after the start', () => {
    const group = (endTime: string) =>
      new FormGroup({
        startDate: new FormControl(DateTime.fromISO('2026-12-09')),
        startTime: new FormControl('10:00'),
        endDate: new FormControl(DateTime.fromISO('2026-12-09')),
        endTime: new FormControl(endTime),
      });
    expect(endAfterStart(group('09:00'))).toEqual({ endBeforeStart: true });
    expect(endAfterStart(group('11:00'))).toBeNull();
  });

  it('splits stored wall-clock text into the picked day and the time, and back', () => {
    const parts = wallClockParts('2026-12-09T10:30');
    expect(parts.date?.toISODate()).toBe('2026-12-09');
    expect(parts.time).toBe('10:30');
    expect(wallClockOf(parts.date, parts.time)).toBe('2026-12-09T10:30');
    expect(wallClockParts('not a time').date).toBeNull();
  });
});
