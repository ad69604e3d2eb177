import { Knex } from 'knex';
import { BookingPurpose } from '@shared/bookings';
import { KitItem } from '@shared/kit';
import { batchesRepository } from '../batches/batches.repository';
import { AppError } from '../errors/app-error';
import { kitRepository } from '../kit/kit.repository';
import { batchHoldConflict, bookingConflict } from './booking-conflict';
import { bookingLocksRepository } from './booking-locks.repository';

/**
 * Locks the item's row, so every booking of it (and every batch claiming it) is decided one after
 * the other, in any server process; refuses an item out of service. Admins may still block an item
 * that is under maintenance.
 */
export async function lockBookableItem(trx: Knex.Transaction, kitItemId: number, purpose: BookingPurpose): Promise<KitItem> {
  const item = await kitRepository.findById(trx, kitItemId, true);
  if (!item) throw new AppError('kit-item-not-found', 'The kit register has no item with this id.', 404, { kitItemId: 'no such item' });
  const blockingForMaintenance = purpose === 'maintenance' && item.state === 'maintenance';
  if (item.state !== 'in_service' && !blockingForMaintenance) {
    const state = item.state === 'maintenance' ? 'under maintenance' : 'retired';
    throw new AppError('kit-unavailable', `${item.code} is ${state} and cannot be booked.`, 409);
  }
  return item;
}

/** When the batch holding a fermenter is expected to hand it back (ms), or null: only when packaged. */
export type HolderRelease = (holderId: number) => Promise<number | null>;

/**
 * Refuses a hold of [start, until) that meets another booking's hold, or a fermenter that a
 * fermenting or conditioning batch holds (except the batch the booking serves). The kit room keeps
 * the hold until packaging; the brew plan passes `holderRelease` and may book from its expected
 * release on, past its own booking. Call under the lock.
 */
export async function assertItemFree(
  trx: Knex.Transaction,
  item: KitItem,
  start: Date,
  until: Date,
  options: { exceptBookingId?: number; batchId?: number | null; holderRelease?: HolderRelease } = {},
): Promise<void> {
  const batch = await batchesRepository.fermenterHolder(trx, item.id, options.batchId ?? 0);
  const release = batch && options.holderRelease ? await options.holderRelease(batch.id) : null;
  if (batch && (release === null || start.getTime() < release)) throw batchHoldConflict(item.code, batch);
  // A released holder's own booking counted on its planned end; its expected release replaces it.
  const overlap = await bookingLocksRepository.firstOverlap(trx, item.id, start, until, options.exceptBookingId, batch?.id);
  if (overlap) throw bookingConflict(overlap);
}
