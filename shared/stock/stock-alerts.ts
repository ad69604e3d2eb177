import { IngredientKind } from '@shared/recipes';
import { STOCK_EPSILON } from './stock-limits';
import { StockUnit } from './stock-lot';

/** An ingredient's stock in one unit with the level below which it should be bought again. */
export interface StockLevel {
  ingredientId: number;
  ingredientName: string;
  ingredientKind: IngredientKind;
  unit: StockUnit;
  onHand: number;
  /** Null when no level is set: the ingredient is never flagged low. */
  reorderLevel: number | null;
}

/** A lot with stock left whose best-before is near or past. */
export interface BestBeforeAlert {
  lotId: number;
  ingredientName: string;
  ingredientKind: IngredientKind;
  unit: StockUnit;
  onHand: number;
  bestBefore: string;
  expired: boolean;
}

export interface StockAlerts {
  lowStock: StockLevel[];
  bestBefore: BestBeforeAlert[];
}

/** yyyy-MM-dd plus whole days (calendar arithmetic in UTC, so no clock change shifts it). */
export function addDays(day: string, days: number): string {
  const date = new Date(`${day}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

/**
 * Low stock: on hand at or below the ingredient's reorder level. Best-before: lots with stock left
 * whose date is past or within `warningDays` of `today`, soonest first.
 */
export function stockAlerts(levels: readonly StockLevel[], lots: readonly Omit<BestBeforeAlert, 'expired'>[], today: string, warningDays: number): StockAlerts {
  const horizon = addDays(today, warningDays);
  return {
    lowStock: levels.filter((level) => level.reorderLevel !== null && level.onHand <= level.reorderLevel + STOCK_EPSILON),
    bestBefore: lots
      .filter((lot) => lot.onHand > STOCK_EPSILON && lot.bestBefore <= horizon)
      .map((lot) => ({ ...lot, expired: lot.bestBefore < today }))
      .sort((a, b) => (a.bestBefore === b.bestBefore ? a.lotId - b.lotId : a.bestBefore < b.bestBefore ? -1 : 1)),
  };
}
