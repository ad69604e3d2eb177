import { Knex } from 'knex';
import { BatchStatus, FERMENTER_HOLDING_STATUSES } from '@shared/batches';
import { GravityPoint } from '@shared/readings';
import { BatchRow, BrewDayMeasurementsRow, KitItemRow } from '../db';

/** A batch row with the names the pages show and its brew-day measurements (null columns when none). */
export interface BatchRecord extends BatchRow {
  brewer_name: string;
  fermenter_code: string | null;
  recipe_name: string | null;
  measured: Omit<BrewDayMeasurementsRow, 'batch_id' | 'updated_by_user_id' | 'updated_at'> | null;
}

const MEASURED_COLUMNS = ['pre_boil_litres', 'pre_boil_gravity', 'fermenter_litres', 'original_gravity', 'original_gravity_temperature_c', 'pitched_at'] as const;

function withNames(db: Knex) {
  return db('batches')
    .join('users', 'users.id', 'batches.brewer_user_id')
    .leftJoin('kit_items', 'kit_items.id', 'batches.fermenter_kit_item_id')
    .leftJoin('recipes', 'recipes.id', 'batches.recipe_id')
    .leftJoin('brew_day_measurements', 'brew_day_measurements.batch_id', 'batches.id')
    .select('batches.*', 'users.name as brewer_name', 'kit_items.code as fermenter_code', 'recipes.name as recipe_name')
    .select(MEASURED_COLUMNS.map((c) => `brew_day_measurements.${c} as m_${c}`))
    .select('brew_day_measurements.batch_id as m_batch_id');
}

function toRecord(row: Record<string, unknown>): BatchRecord {
  const measured = row.m_batch_id === null ? null : Object.fromEntries(MEASURED_COLUMNS.map((c) => [c, row[`m_${c}`]]));
  const record = Object.fromEntries(Object.entries(row).filter(([key]) => !key.startsWith('m_')));
  return { ...record, measured } as unknown as BatchRecord;
}

/** Data access for batches, their brew-day measurements and the fermenters they hold. */
export const batchesRepository = {
  async findById(db: Knex, id: number): Promise<BatchRecord | null> {
    const row = await withNames(db).where('batches.id', id).first();
    return row ? toRecord(row) : null;
  },

  async exists(db: Knex, id: number): Promise<boolean> {
    return Boolean(await db('batches').where({ id }).first('id'));
  },

  /** Newest brew first; optionally one brewer's and only some statuses. */
  async list(db: Knex, filter: { brewerId?: number; statuses?: readonly BatchStatus[] }): Promise<BatchRecord[]> {
    const query = withNames(db).orderBy('batches.brew_date', 'desc').orderBy('batches.id', 'desc');
    if (filter.brewerId !== undefined) query.where('batches.brewer_user_id', filter.brewerId);
    if (filter.statuses) query.whereIn('batches.status', filter.statuses);
    return (await query).map(toRecord);
  },

  async insert(trx: Knex, row: Omit<BatchRow, 'id' | 'created_at' | 'updated_at' | 'planned_at' | 'brewing_at' | 'fermenting_at' | 'conditioning_at' | 'packaged_at' | 'archived_at' | 'status' | 'wort_correction_factor' | 'planned_volume_litres'> & { planned_volume_litres: number }): Promise<number> {
    const [id] = await trx('batches').insert({ ...row, predicted: row.predicted ? JSON.stringify(row.predicted) : null });
    return id;
  },

  /** The batch row under a lock, so status moves and fermenter checks of one batch run one at a time. */
  async lock(trx: Knex.Transaction, id: number): Promise<BatchRow | undefined> {
    return trx('batches').where({ id }).forUpdate().first();
  },

  async update(trx: Knex, id: number, changes: Record<string, unknown>): Promise<void> {
    await trx('batches').where({ id }).update({ ...changes, updated_at: new Date() });
  },

  async saveBrewDay(trx: Knex, batchId: number, row: Omit<BrewDayMeasurementsRow, 'batch_id' | 'updated_at'>): Promise<void> {
    await trx('brew_day_measurements').insert({ batch_id: batchId, ...row, updated_at: new Date() }).onConflict('batch_id').merge();
  },

  async brewDay(db: Knex, batchId: number): Promise<BrewDayMeasurementsRow | undefined> {
    return db('brew_day_measurements').where({ batch_id: batchId }).first();
  },

  /** The fermenter row under a lock: two batches claiming it at once are checked one after the other. */
  async lockFermenter(trx: Knex.Transaction, kitItemId: number): Promise<KitItemRow | undefined> {
    return trx('kit_items').where({ id: kitItemId }).forUpdate().first();
  },

  /** Another batch fermenting or conditioning in this fermenter, if any. */
  async fermenterHolder(trx: Knex, kitItemId: number, exceptBatchId: number): Promise<{ id: number; name: string } | undefined> {
    return trx('batches')
      .where({ fermenter_kit_item_id: kitItemId })
      .whereIn('status', FERMENTER_HOLDING_STATUSES)
      .whereNot('id', exceptBatchId)
      .first('id', 'name');
  },

  /** Fermenters in service, with the batch holding each one now. */
  async listFermenters(db: Knex): Promise<(KitItemRow & { held_by_batch_id: number | null })[]> {
    return db('kit_items')
      .where({ kind: 'fermenter', state: 'in_service' })
      .select('kit_items.*')
      .select(
        db('batches')
          .whereRaw('batches.fermenter_kit_item_id = kit_items.id')
          .whereIn('batches.status', FERMENTER_HOLDING_STATUSES)
          .max('batches.id')
          .as('held_by_batch_id'),
      )
      .orderBy('code');
  },

  /** Corrected gravities of the given batches, each batch's sorted by time. */
  async gravityPoints(db: Knex, batchIds: number[]): Promise<Map<number, GravityPoint[]>> {
    const points = new Map<number, GravityPoint[]>(batchIds.map((id) => [id, []]));
    if (!batchIds.length) return points;
    const rows = await db('gravity_readings')
      .whereIn('batch_id', batchIds)
      .orderBy(['batch_id', 'measured_at'])
      .select('batch_id', 'measured_at', 'corrected_sg', 'instrument');
    for (const row of rows) points.get(row.batch_id)!.push({ at: row.measured_at.getTime(), sg: Number(row.corrected_sg), instrument: row.instrument });
    return points;
  },
};
