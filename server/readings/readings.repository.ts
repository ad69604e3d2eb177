import { Knex } from 'knex';
import { GravityReading, ReadingSortColumn } from '@shared/readings';
import { GravityReadingRow, ReadingUploadRow } from '../db';
import { PageReadingTuple, ReadingSourceNames, sourceIdsOf } from './reading-page-columns';

/** A reading row with the names of who or what it came from. */
export interface ReadingRecord extends GravityReadingRow {
  created_by_name: string | null;
  upload_file_name: string | null;
  push_token_label: string | null;
}

/** A reading ready to store: every column but the ones the database fills. */
export type NewReadingRow = Omit<GravityReadingRow, 'id' | 'created_at' | 'updated_at'>;

const SORT_COLUMN: Record<ReadingSortColumn, string> = { measuredAt: 'measured_at', correctedSg: 'corrected_sg', instrument: 'instrument' };
const num = (v: string | null) => (v === null ? null : Number(v));

function withSources(db: Knex) {
  return db('gravity_readings')
    .leftJoin('users', 'users.id', 'gravity_readings.created_by_user_id')
    .leftJoin('reading_uploads', 'reading_uploads.id', 'gravity_readings.upload_id')
    .leftJoin('batch_push_tokens', 'batch_push_tokens.id', 'gravity_readings.push_token_id')
    .select('gravity_readings.*', 'users.name as created_by_name', 'reading_uploads.file_name as upload_file_name', 'batch_push_tokens.label as push_token_label');
}

/** The columns of a page, in the order of `PageReadingTuple`. */
const PAGE_COLUMNS = [
  'id', 'measured_at', 'instrument', 'raw_value', 'raw_unit', 'sample_temperature_c', 'calibration_temperature_c', 'correction_factor',
  'original_brix', 'corrected_sg', 'source', 'upload_id', 'push_token_id', 'note', 'created_by_user_id', 'updated_at',
];

async function namesById(db: Knex, table: 'users' | 'reading_uploads' | 'batch_push_tokens', column: string, ids: number[]): Promise<Map<number, string>> {
  if (!ids.length) return new Map();
  const rows: { id: number; name: string }[] = await db(table).whereIn('id', ids).select('id', `${column} as name`);
  return new Map(rows.map((r) => [r.id, r.name]));
}

async function sourceNames(db: Knex, rows: readonly PageReadingTuple[]): Promise<ReadingSourceNames> {
  const ids = sourceIdsOf(rows);
  const [users, uploads, tokens] = await Promise.all([
    namesById(db, 'users', 'name', ids.users),
    namesById(db, 'reading_uploads', 'file_name', ids.uploads),
    namesById(db, 'batch_push_tokens', 'label', ids.tokens),
  ]);
  return { users, uploads, tokens };
}

/** The reading as the API sends it. */
export function toReading(r: ReadingRecord): GravityReading {
  return {
    id: r.id,
    batchId: r.batch_id,
    measuredAt: r.measured_at.toISOString(),
    instrument: r.instrument,
    rawValue: Number(r.raw_value),
    rawUnit: r.raw_unit,
    sampleTemperatureC: num(r.sample_temperature_c),
    calibrationTemperatureC: num(r.calibration_temperature_c),
    correctedSg: Number(r.corrected_sg),
    correctionFactor: num(r.correction_factor),
    originalBrix: num(r.original_brix),
    source: r.source,
    sourceDetail: r.upload_file_name ?? r.push_token_label,
    note: r.note,
    createdByName: r.created_by_name,
    updatedAt: r.updated_at.toISOString(),
  };
}

/** Data access for the gravity log. */
export const readingsRepository = {
  /** One page of the log: the count and the rows side by side, then the names of the few sources they share. */
  async page(db: Knex, batchId: number, page: { offset: number; limit: number; sort: ReadingSortColumn; direction: 'asc' | 'desc' }) {
    const [[{ total }], rows] = await Promise.all([
      db('gravity_readings').where({ batch_id: batchId }).count<{ total: number }[]>({ total: '*' }),
      db('gravity_readings')
        .where({ batch_id: batchId })
        .orderBy([{ column: SORT_COLUMN[page.sort], order: page.direction }, { column: 'id', order: page.direction }])
        .offset(page.offset)
        .limit(page.limit)
        .select<unknown[]>(PAGE_COLUMNS)
        // Each row as an array and times as text (no object or Date per row): a page may hold a logger's tens of thousands.
        .options({ rowsAsArray: true, dateStrings: true }) as unknown as Promise<PageReadingTuple[]>,
    ]);
    return { total: Number(total), rows, names: await sourceNames(db, rows) };
  },

  async findById(db: Knex, id: number): Promise<ReadingRecord | null> {
    return (await withSources(db).where('gravity_readings.id', id).first()) ?? null;
  },

  async lock(trx: Knex.Transaction, id: number): Promise<GravityReadingRow | undefined> {
    return trx('gravity_readings').where({ id }).forUpdate().first();
  },

  async insert(trx: Knex, row: NewReadingRow): Promise<number> {
    const [id] = await trx('gravity_readings').insert(row);
    return id;
  },

  /** Inserts the rows, skipping any already present for the same batch, instrument and moment; returns how many went in. */
  async insertNew(trx: Knex, rows: NewReadingRow[]): Promise<number> {
    let inserted = 0;
    for (let i = 0; i < rows.length; i += 1000) {
      const { sql, bindings } = trx('gravity_readings').insert(rows.slice(i, i + 1000)).onConflict().ignore().toSQL().toNative();
      const [result] = await trx.raw(sql, bindings);
      inserted += (result as { affectedRows: number }).affectedRows;
    }
    return inserted;
  },

  async update(trx: Knex, id: number, changes: Partial<NewReadingRow>): Promise<void> {
    await trx('gravity_readings').where({ id }).update({ ...changes, updated_at: new Date() });
  },

  async remove(trx: Knex, id: number): Promise<void> {
    await trx('gravity_readings').where({ id }).delete();
  },

  /** Keys `instrument|epoch ms` of the batch's readings between two moments, to report duplicates. */
  async existingKeys(db: Knex, batchId: number, from: Date, to: Date): Promise<Set<string>> {
    const rows = await db('gravity_readings').where({ batch_id: batchId }).whereBetween('measured_at', [from, to]).select('instrument', 'measured_at');
    return new Set(rows.map((r) => `${r.instrument}|${r.measured_at.getTime()}`));
  },

  /** The batch's refractometer readings under lock, for recomputing them with a new factor. */
  async lockRefractometerReadings(trx: Knex.Transaction, batchId: number): Promise<GravityReadingRow[]> {
    return trx('gravity_readings').where({ batch_id: batchId, instrument: 'refractometer' }).forUpdate();
  },

  /** Every reading of a batch in time order, for the CSV export. */
  async allForBatch(db: Knex, batchId: number): Promise<ReadingRecord[]> {
    return withSources(db).where('gravity_readings.batch_id', batchId).orderBy('gravity_readings.measured_at');
  },

  async insertUpload(trx: Knex, row: Omit<ReadingUploadRow, 'id' | 'created_at'>): Promise<number> {
    const [id] = await trx('reading_uploads').insert(row);
    return id;
  },

  async setUploadImported(trx: Knex, uploadId: number, imported: number): Promise<void> {
    await trx('reading_uploads').where({ id: uploadId }).update({ rows_imported: imported });
  },
};
