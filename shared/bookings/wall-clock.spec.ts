import { instantToWallClock, wallClockToInstant } from './wall-clock';

// Summer time in the EU starts and ends at 01:00 UTC on the last Sunday of March and of October
// (Directive 2000/84/EC, arts. 2 and 3): in 2026 on 29 March and 25 October.
const BERLIN = 'Europe/Berlin';
const utc = (result: ReturnType<typeof wallClockToInstant>) => (typeof result === 'string' ? result : result.toUTC().toISO());

describe('wallClockToInstant', () => {
  it('places a winter time at UTC+1 and a summer time at UTC+2 (Directive 2000/84/EC)', () => {
    expect(utc(wallClockToInstant('2026-03-28T10:00', BERLIN))).toBe('2026-03-28T09:00:00.000Z');
    expect(utc(wallClockToInstant('2026-03-30T10:00', BERLIN))).toBe('2026-03-30T08:00:00.000Z');
  });

  it('refuses a time skipped when the clocks go forward (02:30 on 29 March 2026 in Berlin)', () => {
    expect(wallClockToInstant('2026-03-29T02:30', BERLIN)).toBe('does-not-exist');
  });

  it('takes the standard-time reading of a repeated time when the clocks go back (02:30 CET on 25 October 2026 is 01:30 UTC)', () => {
    expect(utc(wallClockToInstant('2026-10-25T02:30', BERLIN))).toBe('2026-10-25T01:30:00.000Z');
  });

  it('refuses text that is not yyyy-MM-ddTHH:mm or not a calendar date', () => {
    expect(wallClockToInstant('2026-03-28 10:00', BERLIN)).toBe('malformed');
    expect(wallClockToInstant('2026-02-30T10:00', BERLIN)).toBe('malformed');
  });
});

describe('instantToWallClock', () => {
  it('gives back the wall-clock time on both sides of the spring change', () => {
    expect(instantToWallClock('2026-03-28T09:00:00.000Z', BERLIN)).toBe('2026-03-28T10:00');
    expect(instantToWallClock(new Date('2026-03-30T08:00:00.000Z'), BERLIN)).toBe('2026-03-30T10:00');
  });
});
