import { Knex } from 'knex';
import { platoFromSg, ScienceRangeError } from '@shared/science';
import { correctedGravity, CorrectedGravity, RawGravity } from '@shared/readings';
import { effectiveOg, fermentationStart } from '../batches/batch-mapping';
import { BatchRecord, batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';

const SCIENCE_FIELD: Record<string, string> = {
  brix: 'rawValue', currentBrix: 'rawValue', reading: 'rawValue', sg: 'rawValue', plato: 'rawValue',
  temperature: 'sampleTemperatureC', originalBrix: 'rawValue',
};

/** A refused correction as a 400 naming the field, in the library's own words. */
function asFieldError(error: unknown): never {
  if (error instanceof ScienceRangeError) {
    const field = SCIENCE_FIELD[error.parameter] ?? 'rawValue';
    throw new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: error.message });
  }
  throw error;
}

/**
 * Corrects raw readings of one batch. A refractometer reading taken once fermentation started is
 * alcohol-corrected from the batch's OG expressed as the refractometer's original °Bx.
 */
export async function createCorrector(db: Knex, batch: BatchRecord, factor = Number(batch.wort_correction_factor)) {
  const start = fermentationStart(batch)?.getTime() ?? null;
  let originalBrix: number | null | undefined;
  async function original(): Promise<number | null> {
    if (originalBrix === undefined) {
      const points = (await batchesRepository.gravityPoints(db, [batch.id])).get(batch.id)!;
      const og = effectiveOg(batch, points);
      originalBrix = og === null ? null : platoFromSg(og) * factor;
    }
    return originalBrix;
  }

  return async (raw: RawGravity, measuredAt: Date): Promise<CorrectedGravity> => {
    const fermenting = raw.instrument === 'refractometer' && start !== null && measuredAt.getTime() >= start;
    const brix = fermenting ? await original() : null;
    if (fermenting && brix === null) {
      throw new AppError('validation-failed', 'Please check these fields: instrument.', 400, {
        instrument: 'a refractometer reading during fermentation needs the OG: enter it with the brew-day measurements first',
      });
    }
    try {
      return correctedGravity(raw, { wortCorrectionFactor: factor, originalBrix: brix });
    } catch (error) {
      return asFieldError(error);
    }
  };
}

export type ReadingCorrector = Awaited<ReturnType<typeof createCorrector>>;
