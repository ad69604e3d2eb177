import { IngredientKind } from '@shared/recipes';

/** The SI unit a lot is counted in: kilograms, litres or pieces (packs of yeast, tablets). */
export const STOCK_UNITS = ['kg', 'L', 'each'] as const;
export type StockUnit = (typeof STOCK_UNITS)[number];

/** One delivery of one ingredient; its quantity on hand only changes through recorded movements. */
export interface StockLot {
  id: number;
  ingredientId: number;
  ingredientKind: IngredientKind;
  ingredientName: string;
  unit: StockUnit;
  receivedQuantity: number;
  onHand: number;
  /** yyyy-MM-dd. */
  receivedOn: string;
  /** yyyy-MM-dd, or null for goods that keep (sugar, salts). */
  bestBefore: string | null;
  supplierNote: string;
  createdAt: string;
}

export const STOCK_MOVEMENT_KINDS = ['receipt', 'draw', 'adjustment'] as const;
export type StockMovementKind = (typeof STOCK_MOVEMENT_KINDS)[number];

/** Why a lot was adjusted by hand. */
export const ADJUSTMENT_REASONS = ['spillage', 'count', 'spoilage', 'other'] as const;
export type AdjustmentReason = (typeof ADJUSTMENT_REASONS)[number];

export const ADJUSTMENT_REASON_LABELS: Record<AdjustmentReason, string> = {
  spillage: 'Spillage',
  count: 'Stock count',
  spoilage: 'Spoiled or past use',
  other: 'Other',
};

/** One line of a lot's history; movements are only ever added. */
export interface StockMovement {
  id: number;
  lotId: number;
  kind: StockMovementKind;
  /** Signed, in the lot's unit. */
  change: number;
  onHandAfter: number;
  batchId: number | null;
  batchName: string | null;
  reason: AdjustmentReason | null;
  note: string;
  byName: string;
  createdAt: string;
}
