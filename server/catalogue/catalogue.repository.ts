import { Knex } from 'knex';
import { CatalogueKind } from './catalogue-kinds';

type Row = Record<string, unknown> & { id: number; retired_at: Date | null };

function toEntry(spec: CatalogueKind, row: Row): Record<string, unknown> {
  const entry: Record<string, unknown> = { id: row.id };
  for (const [field, column] of Object.entries(spec.columns)) entry[field] = row[column];
  entry.retired = row.retired_at !== null;
  return entry;
}

function toColumns(spec: CatalogueKind, input: Record<string, unknown>): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  for (const [field, column] of Object.entries(spec.columns)) if (field in input) row[column] = input[field];
  return row;
}

/** Data access for the four kinds of catalogue entry, driven by each kind's column map. */
export const catalogueRepository = {
  async list(db: Knex, spec: CatalogueKind, includeRetired: boolean): Promise<Record<string, unknown>[]> {
    const query = db(spec.table).orderBy('name');
    if (!includeRetired) query.whereNull('retired_at');
    return (await query).map((row: Row) => toEntry(spec, row));
  },

  async findById(db: Knex, spec: CatalogueKind, id: number): Promise<Record<string, unknown> | null> {
    const row = await db(spec.table).where({ id }).first();
    return row ? toEntry(spec, row) : null;
  },

  async insert(db: Knex, spec: CatalogueKind, input: Record<string, unknown>): Promise<number> {
    const [id] = await db(spec.table).insert(toColumns(spec, input));
    return id;
  },

  async update(db: Knex, spec: CatalogueKind, id: number, input: Record<string, unknown>, retired?: boolean): Promise<void> {
    const row = toColumns(spec, input);
    if (retired !== undefined) row.retired_at = retired ? new Date() : null;
    await db(spec.table).where({ id }).update({ ...row, updated_at: new Date() });
  },

  async existingNames(db: Knex, spec: CatalogueKind, names: string[]): Promise<Set<string>> {
    if (names.length === 0) return new Set();
    const rows = await db(spec.table).whereIn('name', names).select('name');
    return new Set(rows.map((row: { name: string }) => row.name.toLowerCase()));
  },

  /** Ids among `ids` that exist in the kind's table (retired ones included). */
  async existingIds(db: Knex, spec: CatalogueKind, ids: number[]): Promise<Set<number>> {
    if (ids.length === 0) return new Set();
    const rows = await db(spec.table).whereIn('id', ids).select('id');
    return new Set(rows.map((row: { id: number }) => row.id));
  },
};
