import { Knex } from 'knex';
import { CatalogueKind } from './catalogue-kinds';

type Row = Record<string, unknown> & { id: number; ingredient_id: number; retired_at: Date | null };

function toEntry(spec: CatalogueKind, row: Row): Record<string, unknown> {
  const entry: Record<string, unknown> = { id: row.id, ingredientId: row.ingredient_id };
  for (const [field, column] of Object.entries(spec.columns)) entry[field] = row[column];
  entry.retired = row.retired_at !== null;
  return entry;
}

function toColumns(spec: CatalogueKind, input: Record<string, unknown>): Record<string, unknown> {
  const row: Record<string, unknown> = {};
  for (const [field, column] of Object.entries(spec.columns)) if (field in input) row[column] = input[field];
  return row;
}

// Names as the database compares them: the catalogue's name columns are utf8mb4_unicode_ci, where
// "Cafe" equals "Café" and "CAFE". The list of names travels as one JSON parameter.
const NAMES_TABLE = `JSON_TABLE(?, '$[*]' COLUMNS (i FOR ORDINALITY, n VARCHAR(400) PATH '$')) AS wanted`;
const WANTED_NAME = 'CONVERT(wanted.n USING utf8mb4) COLLATE utf8mb4_unicode_ci';

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

  /** Entries among `ids` (retired ones included). */
  async listByIds(db: Knex, spec: CatalogueKind, ids: number[]): Promise<Record<string, unknown>[]> {
    if (ids.length === 0) return [];
    return (await db(spec.table).whereIn('id', ids)).map((row: Row) => toEntry(spec, row));
  },

  /** A new entry with its ingredient identity; pass the transaction that also records the audit entry. */
  async insert(trx: Knex.Transaction, spec: CatalogueKind, input: Record<string, unknown>): Promise<number> {
    const [ingredientId] = await trx('ingredients').insert({ kind: spec.kind });
    const [id] = await trx(spec.table).insert({ ...toColumns(spec, input), ingredient_id: ingredientId });
    return id;
  },

  async update(db: Knex, spec: CatalogueKind, id: number, input: Record<string, unknown>, retired?: boolean): Promise<void> {
    const row = toColumns(spec, input);
    if (retired !== undefined) row.retired_at = retired ? new Date() : null;
    await db(spec.table).where({ id }).update({ ...row, updated_at: new Date() });
  },

  /** For each of `names` (by position), the id of the entry the database holds under an equal name. */
  async idsByEqualName(db: Knex, spec: CatalogueKind, names: string[]): Promise<Map<number, { id: number; name: string }>> {
    if (names.length === 0) return new Map();
    const [rows] = await db.raw(`SELECT wanted.i AS i, e.id AS id, e.name AS name FROM ${NAMES_TABLE} JOIN ?? AS e ON e.name = ${WANTED_NAME}`, [
      JSON.stringify(names),
      spec.table,
    ]);
    return new Map((rows as { i: number; id: number; name: string }[]).map((row) => [row.i - 1, { id: row.id, name: row.name }]));
  },

  /** For each of `names` (by position), the position of the first name the database holds equal to it. */
  async firstEqualNames(db: Knex, names: string[]): Promise<number[]> {
    if (names.length === 0) return [];
    const [rows] = await db.raw(`SELECT wanted.i AS i, MIN(wanted.i) OVER (PARTITION BY ${WANTED_NAME}) AS first FROM ${NAMES_TABLE} ORDER BY wanted.i`, [
      JSON.stringify(names),
    ]);
    return (rows as { i: number; first: number }[]).map((row) => Number(row.first) - 1);
  },

  /** Entries matched by name as the database compares names, for reading recipe files. */
  async findByNames(db: Knex, spec: CatalogueKind, names: string[]): Promise<(Record<string, unknown> | null)[]> {
    const matches = await catalogueRepository.idsByEqualName(db, spec, names);
    const entries = await catalogueRepository.listByIds(db, spec, [...new Set([...matches.values()].map((m) => m.id))]);
    return names.map((_name, index) => entries.find((entry) => entry.id === matches.get(index)?.id) ?? null);
  },

  /** Ids among `ids` that exist in the kind's table (retired ones included). */
  async existingIds(db: Knex, spec: CatalogueKind, ids: number[]): Promise<Set<number>> {
    if (ids.length === 0) return new Set();
    const rows = await db(spec.table).whereIn('id', ids).select('id');
    return new Set(rows.map((row: { id: number }) => row.id));
  },
};
