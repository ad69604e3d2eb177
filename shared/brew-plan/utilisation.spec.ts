import { BusyInterval, PlanFermenter } from './busy-interval';
import { utilisationOver } from './utilisation';

const HOUR = 3_600_000;
const from = Date.parse('2027-01-04T00:00:00Z');
const to = from + 100 * HOUR;
const item = (id: number, inService = true): PlanFermenter => ({ id, code: `F${id}`, name: `F${id}`, capacityLitres: 30, inService, turnaroundHours: 24 });
const span = (kitItemId: number, kind: BusyInterval['kind'], startH: number, endH: number): BusyInterval => ({ kitItemId, kind, start: from + startH * HOUR, end: from + endH * HOUR, refId: 1, label: '' });

describe('utilisationOver', () => {
  it('counts overlapping holds once and clips them to the window', () => {
    const { items } = utilisationOver([item(1)], [span(1, 'batch', -10, 30), span(1, 'booking', 20, 50), span(1, 'maintenance', 90, 120)], from, to);

    expect(items[0]).toEqual({ kitItemId: 1, inUse: 0.5, maintenance: 0.1 });
  });

  it('weighs each fermenter in service alike for the room and leaves out those out of service', () => {
    const { room } = utilisationOver([item(1), item(2), item(3, false)], [span(1, 'batch', 0, 100), span(3, 'booking', 0, 100)], from, to);

    expect(room).toEqual({ inUse: 0.5, maintenance: 0 });
  });
});
