import { OccupyingBatch } from './batch-occupancy';
import { PlanFermenter } from './busy-interval';
import { expectedRelease } from './fermenter-release';
import { leftOutFermenters } from './left-out-fermenters';
import { proposeSlots } from './propose-slots';
import { placeSchedule } from './slot-placement';

// The rule under test is the plan's own (common practice): a fermenting batch hands its fermenter back
// after its forecast finish, its conditioning days, a packaging day and the fermenter's cleaning turnaround.
const zone = 'Europe/Berlin';
const DAY = 86_400_000;
const HOUR = 3_600_000;
const schedule = { fermentationDays: 14, conditioningDays: 7 };
const began = placeSchedule('2027-01-04', schedule, zone).phases[1].start;
const fermenting = (overrides: Partial<OccupyingBatch> = {}): OccupyingBatch => ({
  status: 'fermenting', brewDate: '2027-01-04', schedule, fermentingAt: began, conditioningAt: null, forecastFinish: began + 6 * DAY, booking: null, ...overrides,
});
const f1: PlanFermenter = { id: 1, code: 'F1', name: 'Conical 1', capacityLitres: 30, inService: true, turnaroundHours: 24 };

describe('expectedRelease', () => {
  it('ends the hold after the forecast finish, the conditioning days, a packaging day and the turnaround', () => {
    expect(expectedRelease(fermenting(), 24, zone, began)).toBe(began + 6 * DAY + 7 * DAY + DAY + 24 * HOUR);
  });

  it('never ends it before now: a batch past its expected end conditions until today', () => {
    const now = began + 30 * DAY;

    expect(expectedRelease(fermenting(), 24, zone, now)).toBe(now + DAY + 24 * HOUR);
  });

  it('has no expected end without a gravity forecast, nor for a conditioning batch', () => {
    expect(expectedRelease(fermenting({ forecastFinish: null }), 24, zone, began)).toBeNull();
    expect(expectedRelease(fermenting({ status: 'conditioning', conditioningAt: began + 6 * DAY }), 24, zone, began)).toBeNull();
  });
});

describe('planning around a fermenting batch', () => {
  const release = expectedRelease(fermenting(), f1.turnaroundHours, zone, began)!;
  const busy = [{ kitItemId: 1, kind: 'batch' as const, start: began - DAY, end: release, refId: 9, label: 'batch "Hedge pale" #9' }];
  const propose = (wantedWeek: string, searchDays: number) =>
    proposeSlots({ fermenters: [f1], busy, volumeLitres: 20, schedule, wantedWeek, zone, notBefore: began, notAfter: began + 365 * DAY, searchDays, limit: 3 });

  it('proposes the held fermenter for a week after its expected release', () => {
    // Forecast finish 2027-01-11 00:00 CET + 7 days conditioning + packaging + 24 h: free from 2027-01-20 00:00.
    expect(propose('2027-01-25', 14).map((s) => [s.fermenter.code, s.placed.brewDate])).toEqual([['F1', '2027-01-25']]);
    expect(propose('2027-01-18', 14).map((s) => s.placed.brewDate)).toEqual(['2027-01-20']);
  });

  it('names the expected release when the search ends before it', () => {
    const slots = propose('2027-01-04', 7);

    const [leftOut] = leftOutFermenters([f1], slots, [{ kitItemId: 1, batchId: 9, batchName: 'Hedge pale', until: release }], 20, zone);

    expect(slots).toEqual([]);
    expect(leftOut.reason).toEqual({ kind: 'held', batchId: 9, batchName: 'Hedge pale', until: new Date(release).toISOString() });
    expect(leftOut.message).toBe('Held by batch "Hedge pale" until about 20 Jan 2027 (its gravity forecast, conditioning, packaging and cleaning), and no free slot after that within the search.');
  });
});
