import { PlanFermenter } from './busy-interval';
import { leftOutFermenters } from './left-out-fermenters';
import { proposeSlots } from './propose-slots';

const fermenter = (id: number, capacityLitres: number | null, inService = true): PlanFermenter => ({
  id, code: `F${id}`, name: `Fermenter ${id}`, capacityLitres, inService, turnaroundHours: 24,
});
const t0 = Date.parse('2027-01-04T00:00:00Z');
const DAY = 86_400_000;

describe('leftOutFermenters', () => {
  // The rule under test is the kit room's own (common practice): a fermenter with a batch fermenting
  // or conditioning in it stays held until that batch is packaged; capacities are the demo's.
  const fermenters = [fermenter(1, 30), fermenter(2, 15), fermenter(3, 60, false), fermenter(4, null), fermenter(5, 40)];
  const busy = [{ kitItemId: 1, kind: 'batch' as const, start: t0 - DAY, end: Number.MAX_SAFE_INTEGER, refId: 9, label: 'batch "Hedge pale" #9' }];
  const slots = proposeSlots({
    fermenters, busy, volumeLitres: 20, schedule: { fermentationDays: 14, conditioningDays: 7 }, wantedWeek: '2027-01-06', zone: 'Europe/Berlin',
    notBefore: t0, notAfter: t0 + 365 * DAY, searchDays: 28, limit: 5,
  });

  it('proposes only the free fermenter that fits and names every other one with its reason', () => {
    const leftOut = leftOutFermenters(fermenters, slots, [{ kitItemId: 1, batchId: 9, batchName: 'Hedge pale', until: null }], 20, 'Europe/Berlin');

    expect(slots.map((s) => s.fermenter.code)).toEqual(['F5']);
    expect(leftOut.map((l) => [l.kitItemCode, l.reason.kind, l.message])).toEqual([
      ['F1', 'held', 'Held by batch "Hedge pale" until it is packaged (no gravity forecast to go by yet).'],
      ['F2', 'too-small', 'Too small: holds 15 L, the batch is 20 L.'],
      ['F3', 'out-of-service', 'Out of service (under maintenance).'],
      ['F4', 'too-small', 'No capacity recorded in the kit room.'],
    ]);
  });

  it('says a fitting fermenter with no hold simply had no free slot in the search', () => {
    const leftOut = leftOutFermenters([fermenter(1, 30)], [], [], 20, 'Europe/Berlin');

    expect(leftOut).toEqual([{ kitItemId: 1, kitItemCode: 'F1', kitItemName: 'Fermenter 1', reason: { kind: 'no-free-slot' }, message: 'No free slot for the whole schedule within the search.' }]);
  });
});
