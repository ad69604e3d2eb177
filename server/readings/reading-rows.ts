import { CorrectedGravity, ReadingInput, ReadingSource } from '@shared/readings';
import { NewReadingRow } from './readings.repository';

/** Whole seconds: the column keeps no fractions, and duplicates are judged on what is stored. */
export function toStoredInstant(iso: string): Date {
  return new Date(Math.floor(new Date(iso).getTime() / 1000) * 1000);
}

/** A row to store from the input, its correction and where it came from. */
export function newReadingRow(
  batchId: number,
  input: ReadingInput,
  corrected: CorrectedGravity,
  source: { source: ReadingSource; userId: number | null; uploadId?: number | null; pushTokenId?: number | null },
): NewReadingRow {
  return {
    batch_id: batchId,
    measured_at: toStoredInstant(input.measuredAt),
    instrument: input.instrument,
    raw_value: String(input.rawValue),
    raw_unit: input.rawUnit,
    sample_temperature_c: input.sampleTemperatureC === null ? null : String(input.sampleTemperatureC),
    calibration_temperature_c: corrected.calibrationTemperatureC === null ? null : String(corrected.calibrationTemperatureC),
    correction_factor: corrected.correctionFactor === null ? null : String(corrected.correctionFactor),
    original_brix: corrected.originalBrix === null ? null : corrected.originalBrix.toFixed(3),
    corrected_sg: corrected.correctedSg.toFixed(5),
    source: source.source,
    upload_id: source.uploadId ?? null,
    push_token_id: source.pushTokenId ?? null,
    note: input.note ?? '',
    created_by_user_id: source.userId,
  };
}
