import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { GravityReading, ReadingInput, ReadingPage, ReadingSortColumn } from '@shared/readings';
import { recordAudit } from '../audit/audit-log.repository';
import { assertMayEditBatch, batchNotFound } from '../batches/batch-access';
import { BatchRecord, batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { createCorrector } from './reading-correction';
import { newReadingRow, toStoredInstant } from './reading-rows';
import { ReadingRecord, readingsRepository, toReading } from './readings.repository';
import { toReadingColumns } from './reading-page-columns';

/** What a reading's edit may change: its temperatures and note. The value as read stays as it was read. */
export type ReadingChanges = Partial<Pick<ReadingInput, 'sampleTemperatureC' | 'calibrationTemperatureC' | 'note'>>;

const readingNotFound = () => new AppError('reading-not-found', 'There is no reading with this id.', 404);
const duplicate = () => new AppError('reading-duplicate', 'This batch already has a reading from this instrument at this time.', 409, { measuredAt: 'already has a reading from this instrument' });

/** The gravity log of a batch: read by every member, written by the batch's editors. */
export function createReadingsService(db: Knex) {
  async function batch(id: number): Promise<BatchRecord> {
    const found = await batchesRepository.findById(db, id);
    if (!found) throw batchNotFound();
    return found;
  }

  async function reading(id: number): Promise<ReadingRecord> {
    const found = await readingsRepository.findById(db, id);
    if (!found) throw readingNotFound();
    return found;
  }

  return {
    batch,

    async page(batchId: number, page: { offset: number; limit: number; sort: ReadingSortColumn; direction: 'asc' | 'desc' }): Promise<ReadingPage> {
      // Asked side by side: a batch that does not exist simply has no rows to page.
      const [exists, { total, rows, names }] = await Promise.all([batchesRepository.exists(db, batchId), readingsRepository.page(db, batchId, page)]);
      if (!exists) throw batchNotFound();
      return { batchId, total, offset: page.offset, columns: toReadingColumns(rows, names) };
    },

    async add(user: SessionUser, batchId: number, input: ReadingInput): Promise<GravityReading> {
      const found = await batch(batchId);
      assertMayEditBatch(user, found);
      const corrected = await (await createCorrector(db, found))(input, toStoredInstant(input.measuredAt));
      const id = await transactionWithRetry(db, async (trx) => {
        try {
          const newId = await readingsRepository.insert(trx, newReadingRow(batchId, input, corrected, { source: 'hand', userId: user.id }));
          await recordAudit(trx, { actorUserId: user.id, action: 'reading-added', subjectType: 'batch', subjectId: batchId, detail: { readingId: newId } });
          return newId;
        } catch (error) {
          if ((error as { code?: string }).code === 'ER_DUP_ENTRY') throw duplicate();
          throw error;
        }
      });
      return toReading((await readingsRepository.findById(db, id))!);
    },

    /** Changes temperatures or note and recomputes the corrected gravity; the raw value is never touched. */
    async edit(user: SessionUser, readingId: number, changes: ReadingChanges): Promise<GravityReading> {
      const before = await reading(readingId);
      const found = await batch(before.batch_id);
      assertMayEditBatch(user, found);
      const current = toReading(before);
      const merged = { ...current, ...changes };
      const corrected = await (await createCorrector(db, found))(merged, before.measured_at);
      await transactionWithRetry(db, async (trx) => {
        if (!(await readingsRepository.lock(trx, readingId))) throw readingNotFound();
        await readingsRepository.update(trx, readingId, {
          sample_temperature_c: merged.sampleTemperatureC === null ? null : String(merged.sampleTemperatureC),
          calibration_temperature_c: corrected.calibrationTemperatureC === null ? null : String(corrected.calibrationTemperatureC),
          note: merged.note,
          corrected_sg: corrected.correctedSg.toFixed(5),
        });
        await recordAudit(trx, { actorUserId: user.id, action: 'reading-edited', subjectType: 'batch', subjectId: found.id, detail: { readingId, before: current, changes: { ...changes } } });
      });
      return toReading((await readingsRepository.findById(db, readingId))!);
    },

    /** Deletes a reading; the audit entry keeps everything it held. */
    async remove(user: SessionUser, readingId: number): Promise<void> {
      const before = await reading(readingId);
      assertMayEditBatch(user, await batch(before.batch_id));
      await transactionWithRetry(db, async (trx) => {
        if (!(await readingsRepository.lock(trx, readingId))) throw readingNotFound();
        await readingsRepository.remove(trx, readingId);
        await recordAudit(trx, { actorUserId: user.id, action: 'reading-deleted', subjectType: 'batch', subjectId: before.batch_id, detail: { reading: toReading(before) } });
      });
    },

    async allForBatch(batchId: number): Promise<GravityReading[]> {
      await batch(batchId);
      return (await readingsRepository.allForBatch(db, batchId)).map(toReading);
    },
  };
}

export type ReadingsService = ReturnType<typeof createReadingsService>;
