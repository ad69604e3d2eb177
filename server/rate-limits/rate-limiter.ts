import { createHash } from 'node:crypto';
import { Knex } from 'knex';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { requestCountersRepository } from './request-counters.repository';

/** How many requests of one kind a key (an address, an account) may make in a window. */
export interface RateLimit {
  points: number;
  windowSeconds: number;
}

/** The outcome of counting one request. */
export interface RateLimitDecision {
  allowed: boolean;
  /** Seconds until the window ends (at least 1). */
  retryAfterSeconds: number;
}

/**
 * A fixed-window limiter whose counters are rows in MariaDB: each request is counted atomically
 * before it is served, so parallel requests and several server processes share one count.
 */
export function createRateLimiter(db: Knex, name: string, limit: RateLimit) {
  // Hashed so that e-mails and addresses of any length make a fixed-size key and are not stored in clear.
  const keyOf = (key: string) => `${name}:${createHash('sha256').update(key).digest('base64url')}`;
  return {
    limit,
    /** Counts one request for `key` and says whether it is within the limit. */
    async consume(key: string): Promise<RateLimitDecision> {
      const state = await transactionWithRetry(db, (trx) => requestCountersRepository.increment(trx, keyOf(key), limit.windowSeconds * 1000));
      return { allowed: state.points <= limit.points, retryAfterSeconds: Math.max(1, Math.ceil(state.msLeft / 1000)) };
    },
    /** Forgets the count of `key` (e.g. after a successful sign-in). */
    async reset(key: string): Promise<void> {
      await requestCountersRepository.remove(db, keyOf(key));
    },
  };
}

export type RateLimiter = ReturnType<typeof createRateLimiter>;
