import { createHash } from 'node:crypto';
import { INSTRUMENT_RESOLUTION_SG } from '@shared/readings';
import { GravityReadingUsed } from '@shared/strength-check';
import { BatchRecord } from '../batches/batches.repository';
import { fermentationStart } from '../batches/batch-mapping';
import { ReadingForCheck } from './strength-check.repository';

/** The OG and FG a check uses, or what is missing. */
export type GravitiesUsed = { og: GravityReadingUsed; fg: GravityReadingUsed; missing: null } | { og: null; fg: null; missing: string };

function fromReading(role: 'og' | 'fg', r: ReadingForCheck): GravityReadingUsed {
  return { role, source: 'reading', readingId: r.id, measuredAt: r.measuredAt.toISOString(), instrument: r.instrument, sg: r.sg, resolutionSg: INSTRUMENT_RESOLUTION_SG[r.instrument] };
}

/**
 * OG: the brew day's (read with a hydrometer), else the last reading before fermentation started,
 * as the batch's own progress figures take it. FG: the latest reading after the OG.
 */
export function gravitiesUsed(batch: BatchRecord, readings: readonly ReadingForCheck[]): GravitiesUsed {
  const measured = batch.measured?.original_gravity;
  const start = fermentationStart(batch)?.getTime();
  const ogReading = measured == null && start !== undefined ? [...readings].reverse().find((r) => r.measuredAt.getTime() < start) : undefined;
  const og: GravityReadingUsed | null = measured != null
    ? { role: 'og', source: 'brew-day', readingId: null, measuredAt: null, instrument: 'hydrometer', sg: Number(measured), resolutionSg: INSTRUMENT_RESOLUTION_SG.hydrometer }
    : ogReading ? fromReading('og', ogReading) : null;
  if (!og) return { og: null, fg: null, missing: 'The batch has no OG yet: enter it with the brew day, or log a reading before fermentation starts.' };
  const latest = readings.length ? readings[readings.length - 1] : undefined;
  if (!latest || latest.id === og.readingId) return { og: null, fg: null, missing: 'The batch has no reading since its OG to stand for the final gravity.' };
  if (latest.sg > og.sg) return { og: null, fg: null, missing: `The latest reading (${latest.sg.toFixed(4)}) is above the OG (${og.sg.toFixed(4)}); check the log.` };
  return { og, fg: fromReading('fg', latest), missing: null };
}

/** A fingerprint of the OG and every reading: any added, changed or deleted reading changes it. */
export function readingsFingerprint(batch: BatchRecord, readings: readonly ReadingForCheck[]): string {
  const og = batch.measured?.original_gravity ?? null;
  const log = readings.map((r) => [r.id, r.sg, r.measuredAt.getTime(), r.instrument]);
  return createHash('sha256').update(JSON.stringify({ og: og === null ? null : Number(og), log })).digest('hex');
}
