import { hasAnyRole, SessionUser } from '@shared/auth';
import { AppError, forbidden } from '../errors/app-error';
import { BatchRecord } from './batches.repository';

/** The batch's brewer, brewers and admins change a batch; every member reads co-op batches. */
export function mayEditBatch(user: SessionUser, batch: Pick<BatchRecord, 'brewer_user_id'>): boolean {
  return batch.brewer_user_id === user.id || hasAnyRole(user.roles, ['brewer', 'admin']);
}

export function assertMayEditBatch(user: SessionUser, batch: Pick<BatchRecord, 'brewer_user_id'>): void {
  if (!mayEditBatch(user, batch)) throw forbidden("Only the batch's brewer, a brewer or an admin may change this batch.");
}

export const batchNotFound = () => new AppError('batch-not-found', 'There is no batch with this id.', 404);
