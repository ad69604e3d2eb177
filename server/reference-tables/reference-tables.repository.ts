import { Knex } from 'knex';
import { ReferenceTableRow, ReferenceTableSummary } from '@shared/reference-tables';

/** A table's header as the service needs it. */
export type StoredTable = ReferenceTableSummary;

const summaryColumns = (db: Knex) => [
  'density_tables.id', 'density_tables.name', 'density_tables.temperature_c', 'density_tables.resolution', 'density_tables.created_at', 'users.name as uploaded_by',
  db.raw('(select count(*) from density_table_rows r where r.density_table_id = density_tables.id) as row_count'),
  db.raw('(select count(distinct c.density_table_row_id) from density_table_corrections c join density_table_rows r on r.id = c.density_table_row_id where r.density_table_id = density_tables.id) as corrected_count'),
];

interface SummaryRecord { id: number; name: string; temperature_c: string; resolution: string; created_at: Date; uploaded_by: string; row_count: number | string; corrected_count: number | string }

function toSummary(r: SummaryRecord): StoredTable {
  return {
    id: r.id, name: r.name, temperature: Number(r.temperature_c), resolution: Number(r.resolution), rowCount: Number(r.row_count),
    correctedCount: Number(r.corrected_count), uploadedBy: r.uploaded_by, uploadedAt: r.created_at.toISOString(),
  };
}

/** Data access for uploaded density tables, their append-only corrections and the lab's choice. */
export const referenceTablesRepository = {
  async list(db: Knex): Promise<StoredTable[]> {
    const rows = await db('density_tables').join('users', 'users.id', 'density_tables.uploaded_by_user_id').select(...summaryColumns(db)).orderBy('density_tables.id', 'desc');
    return (rows as unknown as SummaryRecord[]).map(toSummary);
  },

  async find(db: Knex, id: number): Promise<StoredTable | null> {
    const row = await db('density_tables').join('users', 'users.id', 'density_tables.uploaded_by_user_id').where('density_tables.id', id).first(...summaryColumns(db));
    return row ? toSummary(row as unknown as SummaryRecord) : null;
  },

  async insert(trx: Knex, table: { name: string; temperature: number; resolution: number; userId: number; rows: { line: number; massPercent: number; density: number }[] }): Promise<number> {
    const [id] = await trx('density_tables').insert({ name: table.name, temperature_c: table.temperature, resolution: table.resolution, uploaded_by_user_id: table.userId });
    await trx('density_table_rows').insert(table.rows.map((r) => ({ density_table_id: id, line: r.line, mass_percent: r.massPercent, density: r.density })));
    return id;
  },

  /** Rows in file order, each with its latest correction, if any. */
  async rows(db: Knex, tableId: number): Promise<ReferenceTableRow[]> {
    const rows = await db('density_table_rows').where({ density_table_id: tableId }).orderBy('line').select('id', 'line', 'mass_percent', 'density');
    const corrections = await db('density_table_corrections as c')
      .join('density_table_rows as r', 'r.id', 'c.density_table_row_id')
      .join('users', 'users.id', 'c.corrected_by_user_id')
      .where('r.density_table_id', tableId)
      .orderBy('c.id')
      .select('c.density_table_row_id as row_id', 'c.density', 'c.note', 'c.created_at', 'users.name as corrected_by');
    const latest = new Map<number, { density: string; note: string; created_at: Date; corrected_by: string }>();
    for (const c of corrections) latest.set(c.row_id, c);
    return rows.map((r) => {
      const c = latest.get(r.id);
      return {
        id: r.id, line: r.line, massPercent: Number(r.mass_percent), uploadedDensity: Number(r.density),
        correctedDensity: c ? Number(c.density) : null, correctionNote: c?.note ?? null, correctedBy: c?.corrected_by ?? null, correctedAt: c?.created_at.toISOString() ?? null,
      };
    });
  },

  async rowBelongs(db: Knex, tableId: number, rowId: number): Promise<boolean> {
    return (await db('density_table_rows').where({ id: rowId, density_table_id: tableId }).first('id')) !== undefined;
  },

  async addCorrection(trx: Knex, rowId: number, density: number, note: string, userId: number): Promise<void> {
    await trx('density_table_corrections').insert({ density_table_row_id: rowId, density, note, corrected_by_user_id: userId });
  },

  async labTableId(db: Knex): Promise<number | null> {
    return (await db('lab_settings').where({ id: 1 }).first('density_table_id'))?.density_table_id ?? null;
  },

  async setLabTable(trx: Knex, tableId: number | null, userId: number): Promise<void> {
    await trx('lab_settings').insert({ id: 1, density_table_id: tableId, updated_by_user_id: userId }).onConflict('id').merge({ density_table_id: tableId, updated_by_user_id: userId, updated_at: trx.fn.now() });
  },
};
