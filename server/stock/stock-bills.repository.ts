import { Knex } from 'knex';
import { BatchStatus } from '@shared/batches';
import { IngredientName, StockDraw, StockUnit, VersionBillItem } from '@shared/stock';
import { calendarDay } from '../kit/kit.repository';
import { joinIngredientNames } from './ingredient-names.repository';

/** A batch with what its bill is made from: the version's id and volume, and the batch volume. */
export interface BillSource {
  id: number;
  name: string;
  status: BatchStatus;
  brewerUserId: number;
  brewDate: string;
  batchVolumeLitres: number;
  recipeVersionId: number | null;
  versionVolumeLitres: number | null;
}

const VERSION_VOLUME = "CAST(JSON_VALUE(recipe_versions.design, '$.batchVolumeLitres') AS DOUBLE)";

function billSources(db: Knex) {
  return db('batches')
    .leftJoin('recipe_versions', function joinVersion() {
      this.on('recipe_versions.recipe_id', 'batches.recipe_id').andOn('recipe_versions.version', 'batches.recipe_version');
    })
    .select('batches.id', 'batches.name', 'batches.status', 'batches.brewer_user_id', 'batches.brew_date', 'batches.planned_volume_litres', 'recipe_versions.id as recipe_version_id')
    .select(db.raw(`${VERSION_VOLUME} as version_volume_litres`));
}

function toSource(row: Record<string, unknown>): BillSource {
  return {
    id: row.id as number, name: row.name as string, status: row.status as BatchStatus, brewerUserId: row.brewer_user_id as number,
    brewDate: calendarDay(row.brew_date as Date)!, batchVolumeLitres: Number(row.planned_volume_litres),
    recipeVersionId: (row.recipe_version_id as number | null) ?? null, versionVolumeLitres: row.version_volume_litres === null ? null : Number(row.version_volume_litres),
  };
}

/** Data access for batch bills and the draws made from them. */
export const stockBillsRepository = {
  async batch(db: Knex, batchId: number, lock = false): Promise<BillSource | null> {
    const query = billSources(db).where('batches.id', batchId);
    if (lock) query.forUpdate('batches');
    const row = await query.first();
    return row ? toSource(row) : null;
  },

  /** Planned batches brewing between the two days (inclusive) that have not drawn from stock. */
  async plannedBetween(db: Knex, from: string, to: string): Promise<BillSource[]> {
    const rows = await billSources(db)
      .where('batches.status', 'planned')
      .whereBetween('batches.brew_date', [from, to])
      .whereNotExists(db('stock_draws').whereRaw('stock_draws.batch_id = batches.id'))
      .orderBy(['batches.brew_date', 'batches.id']);
    return rows.map(toSource);
  },

  /** The index lines of the given versions, by version. */
  async versionItems(db: Knex, versionIds: number[]): Promise<Map<number, VersionBillItem[]>> {
    const items = new Map<number, VersionBillItem[]>(versionIds.map((id) => [id, []]));
    if (!versionIds.length) return items;
    const rows = await db('recipe_version_items').whereIn('recipe_version_id', versionIds).orderBy(['recipe_version_id', 'position']);
    for (const row of rows) items.get(row.recipe_version_id)!.push({ ingredientId: row.ingredient_id, amount: Number(row.amount), unit: row.amount_unit });
    return items;
  },

  async ingredientNames(db: Knex, ingredientIds: number[]): Promise<Map<number, IngredientName>> {
    if (!ingredientIds.length) return new Map();
    const rows = await joinIngredientNames(db, db('ingredients as base').select('base.id').whereIn('base.id', ingredientIds), 'base.id');
    return new Map(rows.map((row: Record<string, unknown>) => [row.id as number, { name: row.ingredient_name as string, kind: row.ingredient_kind as IngredientName['kind'] }]));
  },

  async insertDraw(trx: Knex, batchId: number, userId: number, shortfallAccepted: boolean, lines: { ingredientId: number; unit: StockUnit; needed: number; drawn: number; shortfall: number }[]): Promise<number> {
    const [id] = await trx('stock_draws').insert({ batch_id: batchId, drawn_by_user_id: userId, shortfall_accepted: shortfallAccepted });
    if (lines.length) {
      await trx('stock_draw_lines').insert(lines.map((line) => ({ stock_draw_id: id, ingredient_id: line.ingredientId, unit: line.unit, needed: line.needed, drawn: line.drawn, shortfall: line.shortfall })));
    }
    return id;
  },

  async drawOf(db: Knex, batchId: number): Promise<StockDraw | null> {
    const draw = await db('stock_draws').join('users', 'users.id', 'stock_draws.drawn_by_user_id').where('stock_draws.batch_id', batchId).first('stock_draws.*', 'users.name as by_name');
    if (!draw) return null;
    const lines = await joinIngredientNames(db, db('stock_draw_lines').where('stock_draw_lines.stock_draw_id', draw.id).orderBy('stock_draw_lines.id').select('stock_draw_lines.*'), 'stock_draw_lines.ingredient_id');
    return {
      id: draw.id, batchId: draw.batch_id, byName: draw.by_name, createdAt: draw.created_at.toISOString(), shortfallAccepted: Boolean(draw.shortfall_accepted),
      lines: lines.map((line: Record<string, unknown>) => ({
        ingredientId: line.ingredient_id as number, ingredientName: line.ingredient_name as string, ingredientKind: line.ingredient_kind as IngredientName['kind'],
        unit: line.unit as StockUnit, needed: Number(line.needed), drawn: Number(line.drawn), shortfall: Number(line.shortfall),
      })),
    };
  },
};
