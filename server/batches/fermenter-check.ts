import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { batchesRepository } from './batches.repository';

const badFermenter = (reason: string) => new AppError('validation-failed', `Please check these fields: fermenterId.`, 400, { fermenterId: reason });

/** The kit item must be a fermenter in service; a batch moving into it must find it free. */
export async function checkFermenter(trx: Knex.Transaction, kitItemId: number, batchId: number, holding: boolean): Promise<void> {
  const item = await batchesRepository.lockFermenter(trx, kitItemId);
  if (!item || item.kind !== 'fermenter') throw badFermenter('must be a fermenter of the kit register');
  if (item.state !== 'in_service') throw badFermenter(`${item.code} is not in service`);
  if (!holding) return;
  const holder = await batchesRepository.fermenterHolder(trx, kitItemId, batchId);
  if (holder) throw new AppError('fermenter-busy', `${item.code} holds the batch "${holder.name}" until it is packaged.`, 409, { fermenterId: 'is in use' });
}
