import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { pushTokensRepository } from './push-tokens.repository';

/** Requests a logger push may make per window, per token and per address. */
export interface PushRateLimit {
  windowSeconds: number;
  perToken: number;
  perAddress: number;
}

/** A logger pushes every few minutes; a minute's window with room for retries is plenty (common practice for device APIs). */
export const DEFAULT_PUSH_RATE_LIMIT: PushRateLimit = { windowSeconds: 60, perToken: 30, perAddress: 120 };

/**
 * Counts the request in MariaDB rows (fixed windows), so the cap holds across server processes;
 * answers 429 with the seconds left in the window once a key is over its cap.
 */
export async function checkPushRate(db: Knex, limit: PushRateLimit, keys: { token: string; address: string }): Promise<void> {
  const now = Date.now();
  const windowMs = limit.windowSeconds * 1000;
  const windowStart = Math.floor(now / windowMs) * windowMs;
  const [tokenHits, addressHits] = await transactionWithRetry(db, async (trx) => [
    await pushTokensRepository.hit(trx, `token:${keys.token}`, windowStart),
    await pushTokensRepository.hit(trx, `address:${keys.address}`, windowStart),
  ]);
  if (tokenHits > limit.perToken || addressHits > limit.perAddress) {
    const retryAfterSeconds = Math.max(1, Math.ceil((windowStart + windowMs - now) / 1000));
    throw new AppError('too-many-requests', `Too many pushes. Try again in ${retryAfterSeconds} s.`, 429, undefined, retryAfterSeconds);
  }
}
