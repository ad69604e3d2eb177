import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BATCH_STATUS_LABELS, FERMENTER_HOLDING_STATUSES, isBackwardMove, MoveBatchRequest, skippedStatuses } from '@shared/batches';
import { recordAudit } from '../audit/audit-log.repository';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { assertMayEditBatch, batchNotFound } from './batch-access';
import { STATUS_DATE_COLUMN } from './batch-mapping';
import { BatchRow } from '../db';
import { batchesRepository } from './batches.repository';
import { checkFermenter } from './fermenter-check';

/**
 * Moves a batch forward and records when. A move that passes over statuses needs `confirmSkip`
 * (the person was asked); the skipped statuses keep no date. Moving into fermenting or
 * conditioning claims the fermenter from the move's date on, checked under its row lock against
 * other batches and bookings.
 */
export async function moveBatchStatus(db: Knex, user: SessionUser, id: number, move: MoveBatchRequest): Promise<void> {
  await transactionWithRetry(db, async (trx) => {
    const row = await batchesRepository.lock(trx, id);
    if (!row) throw batchNotFound();
    assertMayEditBatch(user, row);
    if (isBackwardMove(row.status, move.status)) {
      throw new AppError('status-backward', `The batch is ${BATCH_STATUS_LABELS[row.status].toLowerCase()}; it can only move forward.`, 409);
    }
    const skipped = skippedStatuses(row.status, move.status);
    if (skipped.length && !move.confirmSkip) {
      const names = skipped.map((s) => BATCH_STATUS_LABELS[s].toLowerCase()).join(', ');
      throw new AppError('status-skips-steps', `This move skips ${names}; confirm to record no date for ${skipped.length > 1 ? 'them' : 'it'}.`, 409);
    }
    const at = move.at ? new Date(move.at) : new Date();
    if (move.at) assertPlausibleMoveTime(row, at);
    const holds = FERMENTER_HOLDING_STATUSES.includes(move.status);
    if (holds && row.fermenter_kit_item_id !== null) await checkFermenter(trx, row.fermenter_kit_item_id, id, at);
    await batchesRepository.update(trx, id, { status: move.status, [STATUS_DATE_COLUMN[move.status]]: at });
    await recordAudit(trx, { actorUserId: user.id, action: 'batch-status-moved', subjectType: 'batch', subjectId: id, detail: { from: row.status, to: move.status, skipped, at: at.toISOString() } });
  });
}

/** A few minutes of clock difference between a phone and the server are not "the future". */
const CLOCK_SKEW_MS = 5 * 60_000;

/**
 * A move recorded as having happened earlier must lie between the status the batch is in now and
 * the present, so the status dates stay in order. The planned date is when the batch was entered,
 * which for a brew logged afterwards comes later than the brewing, so it bounds nothing.
 */
function assertPlausibleMoveTime(row: BatchRow, at: Date): void {
  const previous = row.status === 'planned' ? null : row[STATUS_DATE_COLUMN[row.status]];
  if (previous && at.getTime() < new Date(previous).getTime()) {
    const reason = `must not be before the batch became ${BATCH_STATUS_LABELS[row.status].toLowerCase()} (${new Date(previous).toISOString()})`;
    throw new AppError('validation-failed', `Please check these fields: at (${reason}).`, 400, { at: reason });
  }
  if (at.getTime() > Date.now() + CLOCK_SKEW_MS) {
    throw new AppError('validation-failed', 'Please check these fields: at (must not be in the future).', 400, { at: 'must not be in the future' });
  }
}
