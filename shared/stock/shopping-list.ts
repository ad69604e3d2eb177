import { INGREDIENT_KINDS, IngredientKind } from '@shared/recipes';
import { BillLine, roundQuantity, stockKey } from './batch-bill';
import { STOCK_EPSILON } from './stock-limits';
import { StockUnit } from './stock-lot';

/** A planned batch with its bill. */
export interface PlannedBill {
  batchId: number;
  batchName: string;
  /** yyyy-MM-dd. */
  brewDate: string;
  bill: readonly BillLine[];
}

/** What is on hand of one ingredient in one unit, with its name. */
export interface StockTotal {
  ingredientId: number;
  unit: StockUnit;
  onHand: number;
}

export interface IngredientName {
  name: string;
  kind: IngredientKind;
}

/** One batch's share of a line of the list. */
export interface ShoppingNeed {
  batchId: number;
  batchName: string;
  brewDate: string;
  amount: number;
}

/** One ingredient to buy: what the planned batches need, what is on hand, and the difference. */
export interface ShoppingListLine {
  ingredientId: number;
  ingredientName: string;
  ingredientKind: IngredientKind;
  unit: StockUnit;
  needed: number;
  inStock: number;
  toBuy: number;
  batches: ShoppingNeed[];
}

/**
 * The ingredients the planned bills need beyond stock, one line per ingredient and unit, with the
 * batches that need it (earliest brew first). Lines the stock covers are left out.
 */
export function shoppingList(planned: readonly PlannedBill[], stock: readonly StockTotal[], names: ReadonlyMap<number, IngredientName>): ShoppingListLine[] {
  const onHand = new Map(stock.map((total) => [stockKey(total), total.onHand]));
  const lines = new Map<string, ShoppingListLine>();
  const byBrewDate = [...planned].sort((a, b) => (a.brewDate === b.brewDate ? a.batchId - b.batchId : a.brewDate < b.brewDate ? -1 : 1));
  for (const batch of byBrewDate) {
    for (const item of batch.bill) {
      const key = stockKey(item);
      const name = names.get(item.ingredientId) ?? { name: `Ingredient ${item.ingredientId}`, kind: 'others' as const };
      const line = lines.get(key) ?? {
        ingredientId: item.ingredientId, ingredientName: name.name, ingredientKind: name.kind, unit: item.unit, needed: 0, inStock: onHand.get(key) ?? 0, toBuy: 0, batches: [],
      };
      line.needed = roundQuantity(line.needed + item.amount);
      line.batches.push({ batchId: batch.batchId, batchName: batch.batchName, brewDate: batch.brewDate, amount: item.amount });
      lines.set(key, line);
    }
  }
  return [...lines.values()]
    .map((line) => ({ ...line, toBuy: roundQuantity(Math.max(0, line.needed - line.inStock)) }))
    .filter((line) => line.toBuy > STOCK_EPSILON)
    .sort((a, b) => INGREDIENT_KINDS.indexOf(a.ingredientKind) - INGREDIENT_KINDS.indexOf(b.ingredientKind) || a.ingredientName.localeCompare(b.ingredientName) || a.unit.localeCompare(b.unit));
}
