import { emptyReadingColumns, ReadingColumns } from '@shared/readings';
import { GravityReadingRow } from '../db';

/** The columns a page of the log reads: no join, the names of its sources come in small maps. */
export type PageReadingRow = Omit<GravityReadingRow, 'batch_id' | 'created_at' | 'measured_at' | 'updated_at'> & { measured_at_s: number; updated_at_s: number };

/** Who or what each reading came from, by id. */
export interface ReadingSourceNames {
  users: Map<number, string>;
  uploads: Map<number, string>;
  tokens: Map<number, string>;
}

const num = (v: string | null) => (v === null ? null : Number(v));

/** Rows into the columns the API sends. */
export function toReadingColumns(rows: readonly PageReadingRow[], names: ReadingSourceNames): ReadingColumns {
  const c = emptyReadingColumns();
  let measured = 0;
  let updated = 0;
  for (const r of rows) {
    c.id.push(r.id);
    c.measuredAt.push(r.measured_at_s - measured);
    measured = r.measured_at_s;
    c.instrument.push(r.instrument);
    c.rawValue.push(Number(r.raw_value));
    c.rawUnit.push(r.raw_unit);
    c.sampleTemperatureC.push(num(r.sample_temperature_c));
    c.calibrationTemperatureC.push(num(r.calibration_temperature_c));
    c.correctedSg.push(Number(r.corrected_sg));
    c.correctionFactor.push(num(r.correction_factor));
    c.originalBrix.push(num(r.original_brix));
    c.source.push(r.source);
    c.sourceDetail.push((r.upload_id !== null ? names.uploads.get(r.upload_id) : r.push_token_id !== null ? names.tokens.get(r.push_token_id) : null) ?? null);
    c.note.push(r.note);
    c.createdByName.push(r.created_by_user_id === null ? null : (names.users.get(r.created_by_user_id) ?? null));
    c.updatedAt.push(r.updated_at_s - updated);
    updated = r.updated_at_s;
  }
  return c;
}
