import { Knex } from 'knex';
import { AdjustmentReason, StockMovementKind, StockUnit } from '@shared/stock';
import { DateInput, Decimal, NumericInsert } from './column-types';

// Ingredient stock: lots, draws for batches, every movement and reorder levels.

export interface StockLotRow {
  id: number;
  ingredient_id: number;
  unit: StockUnit;
  received_quantity: Decimal;
  quantity_on_hand: Decimal;
  received_on: Date;
  best_before: Date | null;
  supplier_note: string;
  created_by_user_id: number;
  created_at: Date;
}

export interface StockDrawRow {
  id: number;
  batch_id: number;
  shortfall_accepted: number | boolean;
  drawn_by_user_id: number;
  created_at: Date;
}

export interface StockDrawLineRow {
  id: number;
  stock_draw_id: number;
  ingredient_id: number;
  unit: StockUnit;
  needed: Decimal;
  drawn: Decimal;
  shortfall: Decimal;
}

export interface StockMovementRow {
  id: number;
  stock_lot_id: number;
  kind: StockMovementKind;
  quantity_change: Decimal;
  on_hand_after: Decimal;
  stock_draw_id: number | null;
  reason: AdjustmentReason | null;
  note: string;
  user_id: number;
  created_at: Date;
}

export interface StockReorderLevelRow {
  ingredient_id: number;
  unit: StockUnit;
  reorder_level: Decimal;
  updated_at: Date;
}

declare module 'knex/types/tables' {
  interface Tables {
    stock_lots: Knex.CompositeTableType<StockLotRow, Omit<NumericInsert<StockLotRow, 'received_quantity' | 'quantity_on_hand'>, 'id' | 'created_at' | 'received_on' | 'best_before'> & { received_on: DateInput; best_before: DateInput | null }, { quantity_on_hand: number }>;
    stock_draws: Knex.CompositeTableType<StockDrawRow, Omit<StockDrawRow, 'id' | 'created_at'>>;
    stock_draw_lines: Knex.CompositeTableType<StockDrawLineRow, Omit<NumericInsert<StockDrawLineRow, 'needed' | 'drawn' | 'shortfall'>, 'id'>>;
    stock_movements: Knex.CompositeTableType<StockMovementRow, Omit<NumericInsert<StockMovementRow, 'quantity_change' | 'on_hand_after'>, 'id' | 'created_at'>>;
    stock_reorder_levels: Knex.CompositeTableType<StockReorderLevelRow, Omit<NumericInsert<StockReorderLevelRow, 'reorder_level'>, 'updated_at'>, { reorder_level: number; updated_at: Date }>;
  }
}
