import { BillLine, roundQuantity, stockKey } from './batch-bill';
import { STOCK_EPSILON } from './stock-limits';
import { StockUnit } from './stock-lot';

/** What the plan needs to know of a lot. */
export interface DrawableLot {
  id: number;
  ingredientId: number;
  unit: StockUnit;
  onHand: number;
  bestBefore: string | null;
  receivedOn: string;
}

export interface LotTake {
  lotId: number;
  quantity: number;
}

/** How one bill line is met: which lots give how much, and what is missing. */
export interface DrawPlanLine extends BillLine {
  takes: LotTake[];
  drawn: number;
  shortfall: number;
}

/** Earliest best-before first; lots without one last; then the older delivery, then the lower id. */
export function firstExpiringFirst(a: DrawableLot, b: DrawableLot): number {
  if (a.bestBefore !== b.bestBefore) {
    if (a.bestBefore === null) return 1;
    if (b.bestBefore === null) return -1;
    return a.bestBefore < b.bestBefore ? -1 : 1;
  }
  if (a.receivedOn !== b.receivedOn) return a.receivedOn < b.receivedOn ? -1 : 1;
  return a.id - b.id;
}

/** Takes each bill line from the lots of its ingredient and unit, first-expiring first; never below zero. */
export function planDraw(bill: readonly BillLine[], lots: readonly DrawableLot[]): DrawPlanLine[] {
  const left = new Map(lots.map((lot) => [lot.id, lot.onHand]));
  const sorted = [...lots].sort(firstExpiringFirst);
  return bill.map((line) => {
    let wanted = line.amount;
    const takes: LotTake[] = [];
    for (const lot of sorted) {
      if (wanted <= STOCK_EPSILON) break;
      if (stockKey(lot) !== stockKey(line)) continue;
      const quantity = roundQuantity(Math.min(wanted, left.get(lot.id)!));
      if (quantity <= STOCK_EPSILON) continue;
      takes.push({ lotId: lot.id, quantity });
      left.set(lot.id, roundQuantity(left.get(lot.id)! - quantity));
      wanted = roundQuantity(wanted - quantity);
    }
    const drawn = roundQuantity(takes.reduce((sum, take) => sum + take.quantity, 0));
    return { ...line, takes, drawn, shortfall: roundQuantity(Math.max(0, line.amount - drawn)) };
  });
}

/** True when some line cannot be met in full. */
export const hasShortfall = (plan: readonly DrawPlanLine[]): boolean => plan.some((line) => line.shortfall > STOCK_EPSILON);
