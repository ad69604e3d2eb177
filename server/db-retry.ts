import { Knex } from 'knex';
import { isDeadlock } from './errors/database-errors';

const ATTEMPTS = 5;

/** Runs `work` in a transaction, running it again (after a short random pause) when MariaDB chose it as a deadlock victim. */
export async function transactionWithRetry<T>(db: Knex, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await db.transaction(work);
    } catch (error) {
      if (!isDeadlock(error) || attempt >= ATTEMPTS) throw error;
      await new Promise((resolve) => setTimeout(resolve, Math.random() * 20 * attempt));
    }
  }
}
