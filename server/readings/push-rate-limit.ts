import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { createRateLimiter } from '../rate-limits/rate-limiter';

/** Requests a logger push may make per window, per token and per address. */
export interface PushRateLimit {
  windowSeconds: number;
  perToken: number;
  perAddress: number;
}

/** A logger pushes every few minutes; a minute's window with room for retries is plenty (common practice for device APIs). */
export const DEFAULT_PUSH_RATE_LIMIT: PushRateLimit = { windowSeconds: 60, perToken: 30, perAddress: 120 };

/**
 * The push endpoint's caps, counted per token and per address in `request_counters` before the
 * work, so they hold across server processes; a key over its cap answers 429 with the seconds left.
 */
export function createPushRateCheck(db: Knex, limit: PushRateLimit) {
  const perToken = createRateLimiter(db, 'logger-push-token', { points: limit.perToken, windowSeconds: limit.windowSeconds });
  const perAddress = createRateLimiter(db, 'logger-push-address', { points: limit.perAddress, windowSeconds: limit.windowSeconds });
  return async (keys: { token: string; address: string }): Promise<void> => {
    const decisions = [await perToken.consume(keys.token), await perAddress.consume(keys.address)];
    const refused = decisions.filter((d) => !d.allowed);
    if (refused.length) {
      const retryAfterSeconds = Math.max(...refused.map((d) => d.retryAfterSeconds));
      throw new AppError('too-many-requests', `Too many pushes. Try again in ${retryAfterSeconds} s.`, 429, undefined, retryAfterSeconds);
    }
  };
}
