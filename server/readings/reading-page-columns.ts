import { addToRuns, emptyReadingColumns, GravityUnit, Instrument, ReadingColumns, ReadingSource } from '@shared/readings';
import { Decimal } from '../db-tables/column-types';
import { epochSecondsOfDatetime } from './datetime-seconds';
import { numberOfDecimal } from './decimal-text';

/**
 * One row of a page of the log as the driver hands it, an array in this order (no object per row:
 * a logger's batch runs to tens of thousands). No join: the names of its sources come in small maps.
 * Times and decimals come as the text the database writes (no Date or number made by the driver).
 */
export type PageReadingTuple = [
  id: number,
  measuredAt: string,
  instrument: Instrument,
  rawValue: Decimal,
  rawUnit: GravityUnit,
  sampleTemperatureC: Decimal | null,
  calibrationTemperatureC: Decimal | null,
  correctionFactor: Decimal | null,
  originalBrix: Decimal | null,
  correctedSg: Decimal,
  source: ReadingSource,
  uploadId: number | null,
  pushTokenId: number | null,
  note: string,
  createdByUserId: number | null,
  updatedAt: string,
];

/** Who or what each reading came from, by id. */
export interface ReadingSourceNames {
  users: Map<number, string>;
  uploads: Map<number, string>;
  tokens: Map<number, string>;
}

/** The ids of the users, uploads and push tokens a page's rows name, each once. */
export function sourceIdsOf(rows: readonly PageReadingTuple[]): { users: number[]; uploads: number[]; tokens: number[] } {
  const users = new Set<number>();
  const uploads = new Set<number>();
  const tokens = new Set<number>();
  for (const r of rows) {
    if (r[14] !== null) users.add(r[14]);
    if (r[11] !== null) uploads.add(r[11]);
    if (r[12] !== null) tokens.add(r[12]);
  }
  return { users: [...users], uploads: [...uploads], tokens: [...tokens] };
}

// Held here once: called through the imports' live bindings, each of the loop's calls would first run
// a getter, which costs a tenth of the loop for a logger's batch.
const addRun = addToRuns;
const secondsOf = epochSecondsOfDatetime;
const decimal = numberOfDecimal;
const num = (v: Decimal | null) => (v === null ? null : decimal(v));

/**
 * Rows into the columns the API sends, in one pass. Columns grow by push: an array made at its final
 * length has holes until filled, and JSON.stringify takes a much slower path over such arrays.
 */
export function toReadingColumns(rows: readonly PageReadingTuple[], names: ReadingSourceNames): ReadingColumns {
  const c = emptyReadingColumns();
  let measured = 0;
  let updated = 0;
  for (const r of rows) {
    c.id.push(r[0]);
    const measuredS = secondsOf(r[1]);
    c.measuredAt.push(measuredS - measured);
    measured = measuredS;
    addRun(c.instrument, r[2]);
    c.rawValue.push(decimal(r[3]));
    addRun(c.rawUnit, r[4]);
    c.sampleTemperatureC.push(num(r[5]));
    addRun(c.calibrationTemperatureC, num(r[6]));
    addRun(c.correctionFactor, num(r[7]));
    addRun(c.originalBrix, num(r[8]));
    c.correctedSg.push(decimal(r[9]));
    addRun(c.source, r[10]);
    addRun(c.sourceDetail, (r[11] !== null ? names.uploads.get(r[11]) : r[12] !== null ? names.tokens.get(r[12]) : null) ?? null);
    addRun(c.note, r[13]);
    addRun(c.createdByName, r[14] === null ? null : (names.users.get(r[14]) ?? null));
    const updatedS = secondsOf(r[15]);
    c.updatedAt.push(updatedS - updated);
    updated = updatedS;
  }
  return c;
}
