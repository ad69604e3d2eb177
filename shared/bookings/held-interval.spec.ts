import { heldIntervalsOverlap, heldUntil } from './held-interval';

const at = (iso: string) => new Date(iso);

describe('heldUntil', () => {
  it('adds the turnaround as elapsed hours, across the autumn clock change too (common practice: cleaning time is elapsed time)', () => {
    expect(heldUntil(at('2026-10-24T22:00:00Z'), 24).toISOString()).toBe('2026-10-25T22:00:00.000Z');
  });
});

describe('heldIntervalsOverlap', () => {
  const first = { start: at('2026-12-07T09:00:00Z'), end: at('2026-12-09T09:00:00Z') };

  it('sees an overlap when a second booking starts inside the first one’s turnaround', () => {
    expect(heldIntervalsOverlap(first, { start: at('2026-12-09T08:59:00Z'), end: at('2026-12-10T00:00:00Z') })).toBe(true);
  });

  it('lets a booking start the moment the turnaround ends', () => {
    expect(heldIntervalsOverlap(first, { start: at('2026-12-09T09:00:00Z'), end: at('2026-12-10T00:00:00Z') })).toBe(false);
  });

  it('sees an overlap when a booking’s own turnaround runs into the next booking', () => {
    expect(heldIntervalsOverlap({ start: at('2026-12-06T00:00:00Z'), end: at('2026-12-07T09:01:00Z') }, first)).toBe(true);
  });
});
