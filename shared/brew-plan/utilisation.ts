import { BusyInterval, PlanFermenter } from './busy-interval';

/** Share of a window an item (or the room) is in use or blocked for maintenance, 0–1. */
export interface Utilisation {
  inUse: number;
  maintenance: number;
}

export interface ItemUtilisation extends Utilisation {
  kitItemId: number;
}

/** Length of the union of spans clipped to [from, to). */
function coveredMs(spans: readonly BusyInterval[], from: number, to: number): number {
  const clipped = spans
    .map((s): [number, number] => [Math.max(s.start, from), Math.min(s.end, to)])
    .filter(([s, e]) => e > s)
    .sort((a, b) => a[0] - b[0]);
  let total = 0;
  let reach = from;
  for (const [s, e] of clipped) {
    if (e <= reach) continue;
    total += e - Math.max(s, reach);
    reach = e;
  }
  return total;
}

/**
 * Utilisation over [from, to): time in use (batches and members' bookings, with their turnaround)
 * and time blocked for maintenance, each as a share of the window; the room's figure weighs every
 * fermenter in service alike.
 */
export function utilisationOver(fermenters: readonly PlanFermenter[], busy: readonly BusyInterval[], from: number, to: number): { items: ItemUtilisation[]; room: Utilisation } {
  const window = to - from;
  const items = fermenters.map((f): ItemUtilisation => {
    const mine = busy.filter((b) => b.kitItemId === f.id);
    const maintenance = mine.filter((b) => b.kind === 'maintenance');
    const inUse = mine.filter((b) => b.kind !== 'maintenance');
    return { kitItemId: f.id, inUse: window > 0 ? coveredMs(inUse, from, to) / window : 0, maintenance: window > 0 ? coveredMs(maintenance, from, to) / window : 0 };
  });
  const counted = items.filter((_, i) => fermenters[i].inService);
  const mean = (pick: (u: Utilisation) => number) => (counted.length ? counted.reduce((sum, u) => sum + pick(u), 0) / counted.length : 0);
  return { items, room: { inUse: mean((u) => u.inUse), maintenance: mean((u) => u.maintenance) } };
}
