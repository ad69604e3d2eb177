import { Knex } from 'knex';
import { sessionsRepository } from '../auth/sessions.repository';
import { requestCountersRepository } from '../rate-limits/request-counters.repository';

/** Deletes expired sessions and rate-limit counters. Idempotent, so two server processes may both run it. */
export async function purgeExpiredRows(db: Knex): Promise<{ sessions: number; counters: number }> {
  const sessions = await sessionsRepository.purgeExpired(db, new Date());
  const counters = await requestCountersRepository.purgeExpired(db);
  return { sessions, counters };
}

/** Runs the purge every `intervalMs` (0: never); a failed run (database down) is logged and the next one tries again. */
export function startHousekeeping(db: Knex, intervalMs: number, warn: (error: unknown) => void): () => void {
  if (intervalMs <= 0) return () => {};
  const timer = setInterval(() => {
    purgeExpiredRows(db).catch(warn);
  }, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
