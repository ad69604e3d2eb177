import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { ImportLineProblem, ImportMode, ReadingColumnMapping, ReadingImportResult } from '@shared/readings';
import { recordAudit } from '../audit/audit-log.repository';
import { assertMayEditBatch, batchNotFound } from '../batches/batch-access';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { createCorrector } from './reading-correction';
import { parseReadingsCsv } from './reading-csv';
import { newReadingRow, toStoredInstant } from './reading-rows';
import { NewReadingRow, readingsRepository } from './readings.repository';

/** An uploaded file and how to treat it. */
export interface ReadingUpload {
  fileName: string;
  text: string;
  mode: ImportMode;
  dryRun: boolean;
  columns: ReadingColumnMapping;
}

/**
 * Imports a readings file. Bad lines are reported with their reason; a reading already in the log
 * (or earlier in the file) for the same instrument and moment is reported as a duplicate and never
 * stored twice. "all-or-nothing" stores nothing while any line is bad.
 */
export async function importReadings(db: Knex, user: SessionUser, batchId: number, upload: ReadingUpload, zone: string): Promise<ReadingImportResult> {
  const batch = await batchesRepository.findById(db, batchId);
  if (!batch) throw batchNotFound();
  assertMayEditBatch(user, batch);
  const parsed = parseReadingsCsv(upload.text, upload.columns, zone);
  const correct = await createCorrector(db, batch);
  const problems: ImportLineProblem[] = [...parsed.problems];
  const duplicates: ImportLineProblem[] = [];
  const good: NewReadingRow[] = [];
  const times = parsed.rows.map((r) => toStoredInstant(r.input.measuredAt).getTime());
  const [first, last] = times.reduce(([lo, hi], t) => [Math.min(lo, t), Math.max(hi, t)], [Infinity, -Infinity]);
  const existing = times.length ? await readingsRepository.existingKeys(db, batchId, new Date(first), new Date(last)) : new Set<string>();
  const seen = new Map<string, number>();
  for (const { line, input } of parsed.rows) {
    const at = toStoredInstant(input.measuredAt);
    const key = `${input.instrument}|${at.getTime()}`;
    if (existing.has(key)) { duplicates.push({ line, reason: 'already in the log (same time and instrument)' }); continue; }
    if (seen.has(key)) { duplicates.push({ line, reason: `repeats line ${seen.get(key)} (same time and instrument)` }); continue; }
    seen.set(key, line);
    try {
      good.push(newReadingRow(batchId, input, await correct(input, at), { source: 'file', userId: user.id }));
    } catch (error) {
      if (!(error instanceof AppError) || !error.fields) throw error;
      problems.push({ line, reason: Object.entries(error.fields).map(([f, r]) => `${f} ${r}`).join('; ') });
    }
  }
  problems.sort((a, b) => a.line - b.line);
  const result = { dryRun: upload.dryRun, mode: upload.mode, rowsTotal: parsed.rowsTotal, duplicates, problems };
  if (upload.dryRun || !good.length || (upload.mode === 'all-or-nothing' && problems.length)) return { ...result, imported: 0, notImported: good.length };
  const imported = await transactionWithRetry(db, async (trx) => {
    const uploadId = await readingsRepository.insertUpload(trx, {
      batch_id: batchId, file_name: upload.fileName.slice(0, 255), mode: upload.mode, rows_total: parsed.rowsTotal,
      rows_imported: 0, rows_duplicate: duplicates.length, rows_rejected: problems.length, created_by_user_id: user.id,
    });
    const count = await readingsRepository.insertNew(trx, good.map((row) => ({ ...row, upload_id: uploadId })));
    await readingsRepository.setUploadImported(trx, uploadId, count);
    await recordAudit(trx, { actorUserId: user.id, action: 'readings-imported', subjectType: 'batch', subjectId: batchId, detail: { uploadId, imported: count, duplicates: duplicates.length, rejected: problems.length } });
    return count;
  });
  return { ...result, imported, notImported: good.length - imported };
}
