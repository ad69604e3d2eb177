import { BrewPlanTimeline, TimelineEntry } from '@shared/brew-plan';
import { buildTimelineView } from './timeline-view';

const batch: TimelineEntry = {
  kind: 'batch', label: 'Hedge pale', start: '2027-01-04T07:00:00.000Z', end: '2027-01-26T17:00:00.000Z', heldUntil: '2027-01-27T17:00:00.000Z',
  bookingId: 3, batchId: 9, batchStatus: 'fermenting',
  phases: [
    { phase: 'brew', start: '2027-01-04T07:00:00.000Z', end: '2027-01-04T23:00:00.000Z' },
    { phase: 'fermentation', start: '2027-01-04T23:00:00.000Z', end: '2027-01-18T23:00:00.000Z' },
  ],
  forecastFinish: '2027-01-12T10:00:00.000Z', freesEarlyByDays: 5,
};
const timeline: BrewPlanTimeline = {
  from: '2027-01-04', to: '2027-02-28', timeZone: 'Europe/Berlin', room: { inUse: 0.4167, maintenance: 0.02 },
  lanes: [{ kitItemId: 1, code: 'F1', name: 'Conical 1', capacityLitres: 30, inService: true, turnaroundHours: 24, entries: [batch], utilisation: { inUse: 0.4, maintenance: 0 } }],
};

describe('buildTimelineView', () => {
  it('places the phases as shares of the eight weeks and words a batch’s days (no hours) in the co-op zone', () => {
    const view = buildTimelineView(timeline)!;
    const entry = view.lanes[0].entries[0];

    expect(view.period).toBe('4 Jan 2027 – 28 Feb 2027');
    expect(view.roomInUsePercent).toBe(42);
    expect(entry.when).toBe('4 Jan 2027 – 26 Jan 2027');
    expect(entry.heldUntil).toBe('27 Jan 2027');
    expect(entry.tag).toBe('Fermenting');
    // The window starts at Berlin midnight; the brew day starts 8 h into 56 days.
    expect(entry.segments[0].kind).toBe('brew');
    expect(entry.segments[0].left).toBeCloseTo((8 / (56 * 24)) * 100, 6);
    expect(entry.segments.map((s) => s.kind)).toEqual(['brew', 'fermentation', 'turnaround']);
    expect(entry.forecast).toBe('Forecast: fermentation finishes 12 Jan 2027');
    expect(entry.freesEarly).toBe('Frees up 5 days early, by the gravity forecast');
    expect(entry.movable).toBe(false);
    expect(view.lanes[0].freesEarly).toBe(true);
  });

  it('lets a planned batch be moved from its brew date', () => {
    const planned = { ...timeline, lanes: [{ ...timeline.lanes[0], entries: [{ ...batch, batchStatus: 'planned' as const, forecastFinish: null, freesEarlyByDays: null }] }] };

    const entry = buildTimelineView(planned)!.lanes[0].entries[0];

    expect(entry).toMatchObject({ movable: true, brewDate: '2027-01-04', forecast: null, freesEarly: null });
  });

  it('keeps the hours of a booking, where the time of day matters', () => {
    const booking: TimelineEntry = { ...batch, kind: 'booking', label: 'Booking by Ada', batchId: null, batchStatus: null, phases: [], forecastFinish: null, freesEarlyByDays: null, heldUntil: null };
    const withBooking = { ...timeline, lanes: [{ ...timeline.lanes[0], entries: [booking] }] };

    const entry = buildTimelineView(withBooking)!.lanes[0].entries[0];

    // Europe/Berlin is UTC+1 (CET) in January (IANA tz database).
    expect(entry.when).toBe('4 Jan 2027, 08:00 CET – 26 Jan 2027, 18:00 CET');
  });
});
