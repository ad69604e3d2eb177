import { Knex } from 'knex';
import { SessionUser } from '@shared/auth';
import { FERMENTER_HOLDING_STATUSES } from '@shared/batches';
import { CreateBookingRequest } from '@shared/bookings';
import { batchesRepository } from '../batches/batches.repository';
import { AppError, forbidden } from '../errors/app-error';
import { usersRepository } from '../users/users.repository';

const badField = (field: string, reason: string) => new AppError('validation-failed', `Please check these fields: ${field}.`, 400, { [field]: reason });

/** Whom the booking is for: the caller, or (admins only) another active person. */
export async function bookedFor(db: Knex, user: SessionUser, request: CreateBookingRequest): Promise<number> {
  if (request.userId === undefined || request.userId === user.id) return user.id;
  if (!user.roles.includes('admin')) throw forbidden('Only an admin may book for someone else.');
  const person = await usersRepository.findById(db, request.userId);
  if (!person || !person.active) throw badField('userId', 'no active member has this id');
  return person.id;
}

/** The batch a booking serves: one of the booked person's batches that is not yet packaged. */
export async function linkedBatch(db: Knex, userId: number, batchId: number | undefined): Promise<number | null> {
  if (batchId === undefined) return null;
  const batch = await batchesRepository.findById(db, batchId);
  if (!batch || batch.brewer_user_id !== userId) throw badField('batchId', 'must be one of your batches');
  const open = batch.status === 'planned' || batch.status === 'brewing' || FERMENTER_HOLDING_STATUSES.includes(batch.status);
  if (!open) throw badField('batchId', `is ${batch.status} and needs no more kit`);
  return batch.id;
}
