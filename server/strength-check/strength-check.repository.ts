import { Knex } from 'knex';
import { Instrument } from '@shared/readings';
import { StrengthRecord } from '@shared/strength-check';

/** A reading as the strength check needs it. */
export interface ReadingForCheck { id: number; measuredAt: Date; instrument: Instrument; sg: number }

/** A stored sign-off: its snapshot and the fingerprint of the readings it used. */
export interface StoredSignOff { id: number; batchId: number; record: Omit<StrengthRecord, 'id' | 'stale'>; fingerprint: string }

/** Data access for the strength check: a batch's readings and its sign-offs. */
export const strengthCheckRepository = {
  async readings(db: Knex, batchId: number): Promise<ReadingForCheck[]> {
    const rows = await db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at').orderBy('id').select('id', 'measured_at', 'instrument', 'corrected_sg');
    return rows.map((r) => ({ id: Number(r.id), measuredAt: r.measured_at, instrument: r.instrument, sg: Number(r.corrected_sg) }));
  },

  async insertSignOff(trx: Knex, row: { batchId: number; declared: number; toleranceClassId: number; verdict: string; record: object; fingerprint: string; userId: number }): Promise<number> {
    const [id] = await trx('strength_sign_offs').insert({
      batch_id: row.batchId, declared_percent_volume: row.declared, tolerance_class_id: row.toleranceClassId, verdict: row.verdict,
      record: JSON.stringify(row.record), readings_fingerprint: row.fingerprint, signed_by_user_id: row.userId,
    } as never);
    return id;
  },

  async signOffs(db: Knex, batchId: number): Promise<StoredSignOff[]> {
    const rows = await db('strength_sign_offs').where({ batch_id: batchId }).orderBy('id', 'desc').select('id', 'batch_id', 'record', 'readings_fingerprint');
    return rows.map(toStored);
  },

  async signOff(db: Knex, batchId: number, id: number): Promise<StoredSignOff | null> {
    const row = await db('strength_sign_offs').where({ batch_id: batchId, id }).first('id', 'batch_id', 'record', 'readings_fingerprint');
    return row ? toStored(row) : null;
  },
};

function toStored(row: { id: number; batch_id: number; record: unknown; readings_fingerprint: string }): StoredSignOff {
  const record = typeof row.record === 'string' ? JSON.parse(row.record) : row.record;
  return { id: row.id, batchId: row.batch_id, record, fingerprint: row.readings_fingerprint };
}
