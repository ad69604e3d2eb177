import { batchOccupancy, OccupyingBatch } from './batch-occupancy';
import { placeSchedule } from './slot-placement';

const zone = 'Europe/Berlin';
const DAY = 86_400_000;
const schedule = { fermentationDays: 14, conditioningDays: 7 };
const planned = placeSchedule('2027-01-04', schedule, zone);
const batch = (overrides: Partial<OccupyingBatch>): OccupyingBatch => ({
  status: 'planned', brewDate: '2027-01-04', schedule, fermentingAt: null, conditioningAt: null, forecastFinish: null, booking: null, ...overrides,
});

describe('batchOccupancy', () => {
  it('lays a planned batch out on its schedule and is not early', () => {
    const occupancy = batchOccupancy(batch({}), zone, 0);

    expect(occupancy).toMatchObject({ start: planned.start, end: planned.end, plannedEnd: planned.end, freesEarlyByDays: null });
    expect(occupancy.phases.map((p) => p.phase)).toEqual(['brew', 'fermentation', 'conditioning', 'packaging']);
  });

  it('ends a fermenting batch’s fermentation at its forecast finish and marks the fermenter free early by whole days', () => {
    const began = planned.phases[1].start;
    const occupancy = batchOccupancy(batch({ status: 'fermenting', fermentingAt: began, forecastFinish: began + 6.5 * DAY }), zone, 0);

    const fermentation = occupancy.phases.find((p) => p.phase === 'fermentation')!;
    expect(fermentation.end).toBe(began + 6.5 * DAY);
    // Planned: 14 + 7 days from the 5th, packaging until 18:00 on the 26th; expected: 6.5 + 7 + 1 days, so noon on the 19th.
    expect(occupancy.end).toBe(began + 6.5 * DAY + 7 * DAY + DAY);
    expect(occupancy.freesEarlyByDays).toBe(7);
  });

  it('counts a booking’s end as the planned end', () => {
    const began = planned.phases[1].start;
    const booking = { start: planned.start, end: planned.end + 10 * DAY };

    const occupancy = batchOccupancy(batch({ status: 'fermenting', fermentingAt: began, forecastFinish: began + 14 * DAY, booking }), zone, 0);

    expect(occupancy.plannedEnd).toBe(booking.end);
    expect(occupancy.freesEarlyByDays).toBe(Math.floor((booking.end - occupancy.end) / DAY));
  });

  it('does not call a batch early without a forecast', () => {
    const occupancy = batchOccupancy(batch({ status: 'fermenting', fermentingAt: planned.phases[1].start }), zone, 0);

    expect(occupancy.freesEarlyByDays).toBeNull();
  });

  it('counts conditioning from the day it began', () => {
    const began = planned.start + 9 * DAY;
    const occupancy = batchOccupancy(batch({ status: 'conditioning', fermentingAt: planned.start, conditioningAt: began }), zone, 0);

    expect(occupancy.phases.find((p) => p.phase === 'conditioning')).toEqual({ phase: 'conditioning', start: began, end: began + 7 * DAY });
    expect(occupancy.end).toBe(began + 8 * DAY);
  });

  it('keeps a batch past its expected end in the fermenter until now, packaging the day after', () => {
    const began = planned.start + 9 * DAY;
    const now = began + 20 * DAY;

    const occupancy = batchOccupancy(batch({ status: 'conditioning', fermentingAt: planned.start, conditioningAt: began }), zone, now);

    expect(occupancy.phases.find((p) => p.phase === 'conditioning')!.end).toBe(now);
    expect(occupancy.end).toBe(now + DAY);
  });
});
