import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { CorrectionFactorRequest } from '@shared/batches';
import { ScienceRangeError, wortCorrectionFactor } from '@shared/science';
import { recordAudit } from '../audit/audit-log.repository';
import { assertMayEditBatch, batchNotFound } from '../batches/batch-access';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { createCorrector } from './reading-correction';
import { readingsRepository, toReading } from './readings.repository';

const fieldError = (field: string, reason: string) => new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: reason });

/** The factor from a refractometer reading and a hydrometer (or density meter) reading of the same wort. */
async function derivedFactor(db: Knex, batchId: number, refractometerId: number, hydrometerId: number): Promise<number> {
  const [refr, hydro] = await Promise.all([readingsRepository.findById(db, refractometerId), readingsRepository.findById(db, hydrometerId)]);
  if (!refr || refr.batch_id !== batchId || refr.instrument !== 'refractometer') throw fieldError('refractometerReadingId', 'must be a refractometer reading of this batch');
  if (!hydro || hydro.batch_id !== batchId || !['hydrometer', 'density-meter'].includes(hydro.instrument)) {
    throw fieldError('hydrometerReadingId', 'must be a hydrometer or density meter reading of this batch');
  }
  try {
    return wortCorrectionFactor(Number(refr.raw_value), Number(hydro.corrected_sg));
  } catch (error) {
    if (error instanceof ScienceRangeError) throw fieldError('refractometerReadingId', error.message);
    throw error;
  }
}

/**
 * Sets the batch's wort correction factor and recomputes the corrected gravity of its
 * refractometer readings; their raw °Bx stay exactly as read.
 */
export async function setCorrectionFactor(db: Knex, user: SessionUser, batchId: number, request: CorrectionFactorRequest): Promise<number> {
  const batch = await batchesRepository.findById(db, batchId);
  if (!batch) throw batchNotFound();
  assertMayEditBatch(user, batch);
  const factor = Math.round(('factor' in request ? request.factor : await derivedFactor(db, batchId, request.refractometerReadingId, request.hydrometerReadingId)) * 1000) / 1000;
  const correct = await createCorrector(db, batch, factor);
  await transactionWithRetry(db, async (trx) => {
    if (!(await batchesRepository.lock(trx, batchId))) throw batchNotFound();
    await batchesRepository.update(trx, batchId, { wort_correction_factor: factor });
    for (const row of await readingsRepository.lockRefractometerReadings(trx, batchId)) {
      const corrected = await correct(toReading({ ...row, created_by_name: null, upload_file_name: null, push_token_label: null }), row.measured_at);
      await readingsRepository.update(trx, row.id, {
        corrected_sg: corrected.correctedSg.toFixed(5),
        correction_factor: String(factor),
        original_brix: corrected.originalBrix === null ? null : corrected.originalBrix.toFixed(3),
      });
    }
    await recordAudit(trx, { actorUserId: user.id, action: 'correction-factor-set', subjectType: 'batch', subjectId: batchId, detail: { before: Number(batch.wort_correction_factor), after: factor, request: { ...request } } });
  });
  return factor;
}
