import { Knex } from 'knex';
import { IngredientKind } from '@shared/recipes';
import { AdjustmentReason, StockLot, StockMovement, StockMovementKind, StockUnit } from '@shared/stock';
import { StockLotRow } from '../db';
import { calendarDay } from '../kit/kit.repository';
import { joinIngredientNames } from './ingredient-names.repository';

type LotRecord = StockLotRow & { ingredient_kind: IngredientKind; ingredient_name: string };

function toLot(row: LotRecord): StockLot {
  return {
    id: row.id,
    ingredientId: row.ingredient_id,
    ingredientKind: row.ingredient_kind,
    ingredientName: row.ingredient_name,
    unit: row.unit,
    receivedQuantity: Number(row.received_quantity),
    onHand: Number(row.quantity_on_hand),
    receivedOn: calendarDay(row.received_on)!,
    bestBefore: calendarDay(row.best_before),
    supplierNote: row.supplier_note,
    createdAt: row.created_at.toISOString(),
  };
}

/** A change of one lot, written with the lot's new quantity. */
export interface MovementInput {
  kind: StockMovementKind;
  change: number;
  onHandAfter: number;
  drawId?: number | null;
  reason?: AdjustmentReason | null;
  note?: string;
  userId: number;
}

const lotsWithNames = (db: Knex) => joinIngredientNames(db, db('stock_lots').select('stock_lots.*'), 'stock_lots.ingredient_id');

/** Data access for lots and their movements. */
export const stockLotsRepository = {
  /** Lots with stock first (earliest best-before first), then emptied lots, newest first. */
  async list(db: Knex): Promise<StockLot[]> {
    const rows = await lotsWithNames(db)
      .orderByRaw('stock_lots.quantity_on_hand > 0 DESC, stock_lots.best_before IS NULL, stock_lots.best_before, stock_lots.id DESC');
    return rows.map(toLot);
  },

  async find(db: Knex, id: number): Promise<StockLot | null> {
    const row = await lotsWithNames(db).where('stock_lots.id', id).first();
    return row ? toLot(row) : null;
  },

  /** The lot row under a lock, so adjustments and draws of one lot run one at a time. */
  async lock(trx: Knex.Transaction, id: number): Promise<StockLotRow | undefined> {
    return trx('stock_lots').where({ id }).forUpdate().first();
  },

  /** Lots with stock of these ingredients; with `lock`, locked in id order (the same order for every draw, so no deadlock cycle). */
  async drawable(trx: Knex, ingredientIds: number[], lock: boolean): Promise<StockLotRow[]> {
    if (!ingredientIds.length) return [];
    const query = trx('stock_lots').whereIn('ingredient_id', ingredientIds).where('quantity_on_hand', '>', 0).orderBy('id');
    return lock ? query.forUpdate() : query;
  },

  async ingredientKind(db: Knex, ingredientId: number): Promise<IngredientKind | null> {
    const row = await db('ingredients').where({ id: ingredientId }).first('kind');
    return row?.kind ?? null;
  },

  async insert(trx: Knex, lot: { ingredientId: number; unit: StockUnit; quantity: number; receivedOn: string; bestBefore: string | null; supplierNote: string; userId: number }): Promise<number> {
    const [id] = await trx('stock_lots').insert({
      ingredient_id: lot.ingredientId, unit: lot.unit, received_quantity: lot.quantity, quantity_on_hand: lot.quantity,
      received_on: lot.receivedOn, best_before: lot.bestBefore, supplier_note: lot.supplierNote, created_by_user_id: lot.userId,
    });
    await trx('stock_movements').insert({ stock_lot_id: id, kind: 'receipt', quantity_change: lot.quantity, on_hand_after: lot.quantity, stock_draw_id: null, reason: null, note: '', user_id: lot.userId });
    return id;
  },

  /** Adds a movement and sets the lot's quantity to match; call with the lot locked. */
  async recordMovement(trx: Knex.Transaction, lotId: number, movement: MovementInput): Promise<void> {
    await trx('stock_movements').insert({
      stock_lot_id: lotId, kind: movement.kind, quantity_change: movement.change, on_hand_after: movement.onHandAfter,
      stock_draw_id: movement.drawId ?? null, reason: movement.reason ?? null, note: movement.note ?? '', user_id: movement.userId,
    });
    await trx('stock_lots').where({ id: lotId }).update({ quantity_on_hand: movement.onHandAfter });
  },

  async movements(db: Knex, lotId: number): Promise<StockMovement[]> {
    const rows = await db('stock_movements as m')
      .join('users', 'users.id', 'm.user_id')
      .leftJoin('stock_draws as d', 'd.id', 'm.stock_draw_id')
      .leftJoin('batches as b', 'b.id', 'd.batch_id')
      .where('m.stock_lot_id', lotId)
      .orderBy('m.id')
      .select('m.*', 'users.name as by_name', 'b.id as batch_id', 'b.name as batch_name');
    return rows.map((row) => ({
      id: row.id, lotId: row.stock_lot_id, kind: row.kind, change: Number(row.quantity_change), onHandAfter: Number(row.on_hand_after),
      batchId: row.batch_id ?? null, batchName: row.batch_name ?? null, reason: row.reason, note: row.note, byName: row.by_name, createdAt: row.created_at.toISOString(),
    }));
  },
};
