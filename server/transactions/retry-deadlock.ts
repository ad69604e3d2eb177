import { Knex } from 'knex';

const RETRYABLE = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']);
const ATTEMPTS = 5;

/** Runs `work` in a transaction, again (up to five times) when MariaDB picks it as a deadlock victim. */
export async function transactionWithRetry<T>(db: Knex, work: (trx: Knex.Transaction) => Promise<T>): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await db.transaction(work);
    } catch (error) {
      const code = (error as { code?: string }).code;
      if (!code || !RETRYABLE.has(code) || attempt >= ATTEMPTS) throw error;
      await new Promise((resolve) => setTimeout(resolve, 20 * attempt + Math.random() * 30));
    }
  }
}
