import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { BATCH_STATUS_LABELS, FERMENTER_HOLDING_STATUSES, isBackwardMove, MoveBatchRequest, skippedStatuses } from '@shared/batches';
import { recordAudit } from '../audit/audit-log';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { assertMayEditBatch, batchNotFound } from './batch-access';
import { STATUS_DATE_COLUMN } from './batch-mapping';
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
    const holds = FERMENTER_HOLDING_STATUSES.includes(move.status);
    if (holds && row.fermenter_kit_item_id !== null) await checkFermenter(trx, row.fermenter_kit_item_id, id, at);
    await batchesRepository.update(trx, id, { status: move.status, [STATUS_DATE_COLUMN[move.status]]: at });
    await recordAudit(trx, { actorUserId: user.id, action: 'batch-status-moved', subjectType: 'batch', subjectId: id, detail: { from: row.status, to: move.status, skipped, at: at.toISOString() } });
  });
}
