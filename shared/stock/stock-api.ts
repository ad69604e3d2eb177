import { AdjustmentReason, StockLot, StockUnit } from './stock-lot';
import { DrawPlanLine } from './draw-plan';
import { ShoppingListLine } from './shopping-list';

export const STOCK_PATH = '/api/stock';

/*
 * Routes (roles in brackets; "any" = any signed-in person):
 *   GET    /api/stock/lots                          [any]            StockLot[] (lots with stock first, then emptied ones)
 *   POST   /api/stock/lots                          [brewer, admin]  ReceiveLotRequest → StockLot (201)
 *   GET    /api/stock/lots/:lotId/movements         [any]            StockMovement[] (oldest first)
 *   POST   /api/stock/lots/:lotId/adjustments       [brewer, admin]  AdjustLotRequest → StockLot (409 stock-below-zero)
 *   PUT    /api/stock/reorder-levels/:ingredientId  [brewer, admin]  ReorderLevelRequest → 204
 *   GET    /api/stock/alerts                        [brewer, admin]  StockAlerts (low stock, best-before)
 *   GET    /api/stock/batches/:batchId/draw         [any]            DrawPreview
 *   POST   /api/stock/batches/:batchId/draw         [brewer, admin]  DrawRequest → StockDraw (409 stock-shortfall unless accepted)
 *   GET    /api/stock/shopping-list?from&to         [any]            ShoppingList
 *   GET    /api/stock/shopping-list/export?from&to  [any]            text/csv
 */

export interface ReceiveLotRequest {
  ingredientId: number;
  unit: StockUnit;
  /** In `unit` (kg, L or a count). */
  quantity: number;
  receivedOn: string;
  bestBefore: string | null;
  supplierNote: string;
}

/** A count sets the quantity found; the other reasons change it by a signed amount. */
export type AdjustLotRequest =
  | { reason: 'count'; countedQuantity: number; note: string }
  | { reason: Exclude<AdjustmentReason, 'count'>; change: number; note: string };

export interface ReorderLevelRequest {
  unit: StockUnit;
  /** Null clears it. */
  level: number | null;
}

/** What drawing a batch's bill would take now, or what was taken. */
export interface DrawPreview {
  batchId: number;
  batchName: string;
  /** Why the batch cannot be drawn (no recipe, already drawn, packaged), or null. */
  blockedReason: string | null;
  lines: DrawLineView[];
  /** The draw already made for this batch, if any. */
  drawn: StockDraw | null;
}

/** A plan line with the ingredient's name and the lots' best-before dates. */
export interface DrawLineView extends DrawPlanLine {
  ingredientName: string;
  ingredientKind: StockLot['ingredientKind'];
  takes: (DrawPlanLine['takes'][number] & { bestBefore: string | null })[];
}

export interface DrawRequest {
  /** True once the person has seen the shortfalls and chose to draw what there is. */
  acceptShortfall: boolean;
}

/** A draw as recorded: lines with what was taken and what was short. */
export interface StockDraw {
  id: number;
  batchId: number;
  byName: string;
  createdAt: string;
  shortfallAccepted: boolean;
  lines: { ingredientId: number; ingredientName: string; ingredientKind: StockLot['ingredientKind']; unit: StockUnit; needed: number; drawn: number; shortfall: number }[];
}

export interface ShoppingList {
  from: string;
  to: string;
  /** Planned batches in the horizon whose bills were counted. */
  batchCount: number;
  /** Planned batches in the horizon without a recipe version (nothing to count). */
  batchesWithoutRecipe: number;
  lines: ShoppingListLine[];
}
