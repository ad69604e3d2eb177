import { DEFAULT_SCHEDULES, scheduleForYeast, scheduleTotalDays } from './brew-schedule';
import { heldEnd, placeSchedule } from './slot-placement';

const zone = 'Europe/Berlin';
const iso = (ms: number) => new Date(ms).toISOString();

describe('scheduleForYeast', () => {
  it('reads a yeast working at 9–14 °C as a lager yeast and one at 16–22 °C as an ale yeast (common practice, from memory)', () => {
    expect(scheduleForYeast({ temperatureMaxC: 14 })).toEqual({ schedule: DEFAULT_SCHEDULES.lager, basis: 'lager-yeast' });
    expect(scheduleForYeast({ temperatureMaxC: 22 })).toEqual({ schedule: DEFAULT_SCHEDULES.ale, basis: 'ale-yeast' });
    expect(scheduleForYeast(null).basis).toBe('no-yeast');
  });

  it('counts the brew day and the packaging day around fermentation and conditioning', () => {
    expect(scheduleTotalDays({ fermentationDays: 14, conditioningDays: 7 })).toBe(23);
  });
});

describe('placeSchedule', () => {
  it('takes the fermenter from 08:00 on the brew day until 18:00 on the packaging day, in the co-op zone', () => {
    const placed = placeSchedule('2027-01-04', { fermentationDays: 14, conditioningDays: 7 }, zone);

    // Berlin is UTC+1 in winter.
    expect(iso(placed.start)).toBe('2027-01-04T07:00:00.000Z');
    expect(iso(placed.end)).toBe('2027-01-26T17:00:00.000Z');
    expect(placed.phases.map((p) => [p.phase, iso(p.start), iso(p.end)])).toEqual([
      ['brew', '2027-01-04T07:00:00.000Z', '2027-01-04T23:00:00.000Z'],
      ['fermentation', '2027-01-04T23:00:00.000Z', '2027-01-18T23:00:00.000Z'],
      ['conditioning', '2027-01-18T23:00:00.000Z', '2027-01-25T23:00:00.000Z'],
      ['packaging', '2027-01-25T23:00:00.000Z', '2027-01-26T17:00:00.000Z'],
    ]);
  });

  it('keeps the wall-clock hours across the spring clock change (Directive 2000/84/EC: last Sunday of March, 2027-03-28)', () => {
    const placed = placeSchedule('2027-03-20', { fermentationDays: 8, conditioningDays: 0 }, zone);

    expect(iso(placed.start)).toBe('2027-03-20T07:00:00.000Z');
    // 18:00 summer time (UTC+2) on the packaging day, 2027-03-29.
    expect(iso(placed.end)).toBe('2027-03-29T16:00:00.000Z');
    expect(placed.phases.map((p) => p.phase)).toEqual(['brew', 'fermentation', 'packaging']);
  });

  it('adds the turnaround as elapsed hours after packaging', () => {
    const placed = placeSchedule('2027-01-04', { fermentationDays: 14, conditioningDays: 7 }, zone);

    expect(iso(heldEnd(placed, 24))).toBe('2027-01-27T17:00:00.000Z');
  });
});
