import fc from 'fast-check';
import { BusyInterval, collisionsWith, PlanFermenter } from './busy-interval';
import { ProposalInput, proposeSlots } from './propose-slots';
import { placeSchedule } from './slot-placement';

const zone = 'Europe/Berlin';
const DAY = 86_400_000;
const HOUR = 3_600_000;
const t0 = Date.parse('2027-01-04T00:00:00Z');

const fermenter = (id: number, capacityLitres: number | null, turnaroundHours = 24, inService = true): PlanFermenter => ({
  id, code: `F${id}`, name: `Fermenter ${id}`, capacityLitres, inService, turnaroundHours,
});

const input = (overrides: Partial<ProposalInput>): ProposalInput => ({
  fermenters: [],
  busy: [],
  volumeLitres: 20,
  schedule: { fermentationDays: 14, conditioningDays: 7 },
  wantedWeek: '2027-01-06',
  zone,
  notBefore: t0,
  notAfter: t0 + 365 * DAY,
  searchDays: 26 * 7,
  limit: 6,
  ...overrides,
});

describe('proposeSlots', () => {
  it('proposes the Monday of the wanted week on every free fermenter that holds the batch, smallest first', () => {
    const slots = proposeSlots(input({ fermenters: [fermenter(5, 60), fermenter(1, 30), fermenter(2, 15)] }));

    expect(slots.map((s) => [s.fermenter.code, s.placed.brewDate])).toEqual([['F1', '2027-01-04'], ['F5', '2027-01-04']]);
  });

  it('starts after a booking’s cleaning turnaround and never inside it', () => {
    const placed = placeSchedule('2027-01-04', { fermentationDays: 3, conditioningDays: 0 }, zone);
    const busy: BusyInterval[] = [{ kitItemId: 1, kind: 'booking', start: placed.start, end: placed.end + 48 * HOUR, refId: 7, label: 'booking #7' }];

    const [slot] = proposeSlots(input({ fermenters: [fermenter(1, 30)], busy }));

    // Packaging ends 2027-01-08 18:00, the hold two days later at 18:00: the next 08:00 start is on the 11th.
    expect(slot.placed.brewDate).toBe('2027-01-11');
  });

  it('leaves out fermenters out of service, without a capacity or too small', () => {
    const slots = proposeSlots(input({ fermenters: [fermenter(1, 30, 24, false), fermenter(2, null), fermenter(3, 19.5)] }));

    expect(slots).toEqual([]);
  });

  it('refuses a slot whose own turnaround would run into the next booking', () => {
    const schedule = { fermentationDays: 1, conditioningDays: 0 };
    const nextStart = placeSchedule('2027-01-07', schedule, zone).start;
    const busy: BusyInterval[] = [{ kitItemId: 1, kind: 'maintenance', start: nextStart, end: nextStart + 100 * DAY, refId: 9, label: 'service' }];

    // Monday's batch hands back on Wednesday 18:00; a 24 h turnaround ends Thursday 18:00, past Thursday 08:00.
    const slots = proposeSlots(input({ fermenters: [fermenter(1, 30, 24)], busy, schedule, searchDays: 14 }));
    const shortTurnaround = proposeSlots(input({ fermenters: [fermenter(1, 30, 4)], busy, schedule, searchDays: 14 }));

    expect(slots).toEqual([]);
    expect(shortTurnaround[0].placed.brewDate).toBe('2027-01-04');
  });

  it('never proposes a collision or a fermenter too small, over random calendars', () => {
    const fermenters = fc.array(
      fc.record({ capacityLitres: fc.option(fc.integer({ min: 5, max: 80 }), { nil: null }), turnaroundHours: fc.integer({ min: 0, max: 168 }), inService: fc.boolean() }),
      { minLength: 1, maxLength: 6 },
    );
    const busy = fc.array(
      fc.record({ item: fc.nat(5), kind: fc.constantFrom('booking', 'maintenance', 'batch' as const), startHours: fc.integer({ min: -500, max: 6000 }), hours: fc.integer({ min: 1, max: 2000 }) }),
      { maxLength: 60 },
    );
    const scenario = fc.record({
      fermenters, busy, volume: fc.integer({ min: 1, max: 80 }),
      fermentationDays: fc.integer({ min: 1, max: 30 }), conditioningDays: fc.integer({ min: 0, max: 30 }), wantedOffsetDays: fc.integer({ min: 0, max: 200 }), searchDays: fc.integer({ min: 7, max: 70 }),
    });

    fc.assert(
      fc.property(scenario, (s) => {
        const items = s.fermenters.map((f, i) => fermenter(i + 1, f.capacityLitres, f.turnaroundHours, f.inService));
        const calendar: BusyInterval[] = s.busy.map((b, i) => ({ kitItemId: (b.item % items.length) + 1, kind: b.kind, start: t0 + b.startHours * HOUR, end: t0 + (b.startHours + b.hours) * HOUR, refId: i, label: `#${i}` }));
        const wantedWeek = new Date(t0 + s.wantedOffsetDays * DAY).toISOString().slice(0, 10);
        const slots = proposeSlots(input({ fermenters: items, busy: calendar, volumeLitres: s.volume, wantedWeek, searchDays: s.searchDays, schedule: { fermentationDays: s.fermentationDays, conditioningDays: s.conditioningDays } }));
        for (const slot of slots) {
          expect(slot.fermenter.inService).toBe(true);
          expect(slot.fermenter.capacityLitres).toBeGreaterThanOrEqual(s.volume);
          expect(slot.heldUntil).toBe(slot.placed.end + slot.fermenter.turnaroundHours * HOUR);
          expect(collisionsWith(calendar, slot.fermenter.id, slot.placed.start, slot.heldUntil)).toEqual([]);
          expect(slot.placed.start).toBeGreaterThanOrEqual(t0);
        }
        // Earliest: the day before each proposal on the same fermenter was taken (or before the search began).
        for (const slot of slots) {
          const dayBefore = new Date(slot.placed.start - DAY).toISOString().slice(0, 10);
          const earlier = placeSchedule(dayBefore, { fermentationDays: s.fermentationDays, conditioningDays: s.conditioningDays }, zone);
          const weekMonday = new Date(Date.parse(`${wantedWeek}T12:00:00Z`) - ((new Date(`${wantedWeek}T12:00:00Z`).getUTCDay() + 6) % 7) * DAY).toISOString().slice(0, 10);
          if (dayBefore < weekMonday || earlier.start < t0) continue;
          expect(collisionsWith(calendar, slot.fermenter.id, earlier.start, earlier.end + slot.fermenter.turnaroundHours * HOUR).length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 100 },
    );
  });
});
