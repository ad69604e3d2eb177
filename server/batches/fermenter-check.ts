import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { bookingConflict } from '../bookings/booking-conflict';
import { bookingLocksRepository } from '../bookings/booking-locks.repository';
import { batchesRepository } from './batches.repository';

const badFermenter = (reason: string) => new AppError('validation-failed', `Please check these fields: fermenterId.`, 400, { fermenterId: reason });

/**
 * The kit item must be a fermenter in service. A batch that holds it from `holdsFrom` on (until it
 * is packaged) must find no other batch in it and no booking still held then, except bookings
 * serving this batch. Checked under the item's row lock, the same lock bookings take.
 */
export async function checkFermenter(trx: Knex.Transaction, kitItemId: number, batchId: number, holdsFrom: Date | null): Promise<void> {
  const item = await batchesRepository.lockFermenter(trx, kitItemId);
  if (!item || item.kind !== 'fermenter') throw badFermenter('must be a fermenter of the kit register');
  if (item.state !== 'in_service') throw badFermenter(`${item.code} is not in service`);
  if (!holdsFrom) return;
  const holder = await batchesRepository.fermenterHolder(trx, kitItemId, batchId);
  if (holder) throw new AppError('fermenter-busy', `${item.code} holds the batch "${holder.name}" until it is packaged.`, 409, { fermenterId: 'is in use' });
  const booking = await bookingLocksRepository.firstHeldFrom(trx, kitItemId, holdsFrom, batchId);
  if (booking) throw bookingConflict(booking);
}
