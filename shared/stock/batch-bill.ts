import { STOCK_EPSILON } from './stock-limits';
import { StockUnit } from './stock-lot';

/** One line of a recipe version's index of what it uses (kg, L or a count). */
export interface VersionBillItem {
  ingredientId: number;
  amount: number;
  unit: StockUnit;
}

/** What a batch needs of one ingredient, in one unit. */
export interface BillLine {
  ingredientId: number;
  unit: StockUnit;
  amount: number;
}

/** Six decimals: a milligram of a kilogram-counted ingredient, enough for any brewery scale. */
export const roundQuantity = (value: number): number => Math.round(value * 1e6) / 1e6;

/** A stable key for an ingredient counted in one unit. */
export const stockKey = (line: { ingredientId: number; unit: StockUnit }): string => `${line.ingredientId}:${line.unit}`;

/**
 * The bill of a batch: the version's lines scaled by batch volume over the version's volume, lines
 * of one ingredient added together. Counted items (yeast packs, tablets) are rounded up to whole
 * pieces, since a part pack cannot be bought (common practice: pitch more, not less).
 */
export function batchBill(items: readonly VersionBillItem[], versionVolumeLitres: number, batchVolumeLitres: number): BillLine[] {
  if (!(versionVolumeLitres > 0) || !(batchVolumeLitres > 0)) throw new RangeError('Both volumes must be above zero.');
  const ratio = batchVolumeLitres / versionVolumeLitres;
  const lines = new Map<string, BillLine>();
  for (const item of items) {
    const key = stockKey(item);
    const line = lines.get(key) ?? { ingredientId: item.ingredientId, unit: item.unit, amount: 0 };
    line.amount += item.amount * ratio;
    lines.set(key, line);
  }
  return [...lines.values()].map((line) => ({
    ...line,
    amount: line.unit === 'each' ? Math.ceil(line.amount - STOCK_EPSILON) : roundQuantity(line.amount),
  }));
}
