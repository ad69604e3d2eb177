import { Knex } from 'knex';
import { retryOnDeadlock } from '../database/retry-on-deadlock';

/** Runs `work` in a transaction, and the whole transaction again when MariaDB picks it as a deadlock victim. */
export function transactionWithRetry<T>(db: Knex, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  return retryOnDeadlock(() => db.transaction(work));
}
