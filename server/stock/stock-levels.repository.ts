import { Knex } from 'knex';
import { BestBeforeAlert, StockLevel, StockTotal, StockUnit } from '@shared/stock';
import { calendarDay } from '../kit/kit.repository';
import { joinIngredientNames } from './ingredient-names.repository';

/** Data access for totals on hand, reorder levels and lots near their best-before. */
export const stockLevelsRepository = {
  /** What is on hand of each ingredient in each unit. */
  async totals(db: Knex): Promise<StockTotal[]> {
    const rows = await db('stock_lots').groupBy('ingredient_id', 'unit').select('ingredient_id', 'unit').sum({ on_hand: 'quantity_on_hand' });
    return rows.map((row) => ({ ingredientId: row.ingredient_id, unit: row.unit, onHand: Number(row.on_hand) }));
  },

  /** Every ingredient with a reorder level, with what is on hand of it (zero when nothing is). */
  async levels(db: Knex): Promise<StockLevel[]> {
    const onHand = db('stock_lots as l')
      .whereRaw('l.ingredient_id = r.ingredient_id AND l.unit = r.unit')
      .sum('l.quantity_on_hand');
    const query = db('stock_reorder_levels as r').select('r.ingredient_id', 'r.unit', 'r.reorder_level', onHand.as('on_hand'));
    const rows = await joinIngredientNames(db, query, 'r.ingredient_id');
    return rows.map((row: Record<string, unknown>) => ({
      ingredientId: row.ingredient_id as number, ingredientName: row.ingredient_name as string, ingredientKind: row.ingredient_kind as StockLevel['ingredientKind'],
      unit: row.unit as StockUnit, onHand: Number(row.on_hand ?? 0), reorderLevel: Number(row.reorder_level),
    }));
  },

  /** Lots with stock whose best-before is on or before `until`. */
  async lotsBestBeforeBy(db: Knex, until: string): Promise<Omit<BestBeforeAlert, 'expired'>[]> {
    const query = db('stock_lots').where('stock_lots.quantity_on_hand', '>', 0).where('stock_lots.best_before', '<=', until)
      .select('stock_lots.id', 'stock_lots.unit', 'stock_lots.quantity_on_hand', 'stock_lots.best_before');
    const rows = await joinIngredientNames(db, query, 'stock_lots.ingredient_id');
    return rows.map((row: Record<string, unknown>) => ({
      lotId: row.id as number, ingredientName: row.ingredient_name as string, ingredientKind: row.ingredient_kind as StockLevel['ingredientKind'],
      unit: row.unit as StockUnit, onHand: Number(row.quantity_on_hand), bestBefore: calendarDay(row.best_before as Date)!,
    }));
  },

  async setReorderLevel(trx: Knex, ingredientId: number, unit: StockUnit, level: number | null): Promise<void> {
    if (level === null) {
      await trx('stock_reorder_levels').where({ ingredient_id: ingredientId, unit }).del();
      return;
    }
    await trx('stock_reorder_levels').insert({ ingredient_id: ingredientId, unit, reorder_level: level }).onConflict(['ingredient_id', 'unit']).merge({ reorder_level: level, updated_at: new Date() });
  },
};
