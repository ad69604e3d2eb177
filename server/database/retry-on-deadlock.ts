/** MariaDB errors that mean "try the whole transaction again": a deadlock victim or a lock wait that ran out. */
const RETRYABLE = new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']);

function isRetryable(error: unknown): boolean {
  return typeof error === 'object' && error !== null && RETRYABLE.has((error as { code?: string }).code ?? '');
}

/** Runs `work` (a whole transaction) and runs it again, after a short random pause, when the database chose it as a deadlock victim. */
export async function retryOnDeadlock<T>(work: () => Promise<T>, attempts = 5): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (error) {
      if (!isRetryable(error) || attempt >= attempts) throw error;
      await new Promise((resolve) => setTimeout(resolve, 10 + Math.random() * 40 * attempt));
    }
  }
}
