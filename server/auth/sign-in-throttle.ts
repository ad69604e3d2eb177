import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { createRateLimiter } from '../rate-limits/rate-limiter';

/** Limits on password checks: per account and address, and per address over all accounts. */
export interface SignInThrottleLimits {
  perAccountAndAddress: number;
  windowSeconds: number;
  /** Looser and much shorter than the account limit, so others' failures behind one NAT block a member briefly at most. */
  perAddress: number;
  addressWindowSeconds: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInThrottleLimits = { perAccountAndAddress: 5, windowSeconds: 15 * 60, perAddress: 30, addressWindowSeconds: 60 };

function tooMany(retryAfterSeconds: number): AppError {
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return new AppError('too-many-attempts', `Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, 429, undefined, retryAfterSeconds);
}

/**
 * Counts every password check before it is made (atomically, in the database), so however many
 * requests arrive at once and at however many server processes, no more checks run than allowed.
 */
export function createSignInThrottle(db: Knex, limits: SignInThrottleLimits = DEFAULT_SIGN_IN_LIMITS) {
  const byAddress = createRateLimiter(db, 'sign-in-address', { points: limits.perAddress, windowSeconds: limits.addressWindowSeconds });
  const byAccount = createRateLimiter(db, 'sign-in-account', { points: limits.perAccountAndAddress, windowSeconds: limits.windowSeconds });
  const accountKey = (email: string, ip: string) => `${email.toLowerCase()}|${ip}`;

  return {
    /** Counts one password check; throws 429 with a retry time when either limit is used up. */
    async admit(email: string, ip: string): Promise<void> {
      const address = await byAddress.consume(ip);
      if (!address.allowed) throw tooMany(address.retryAfterSeconds);
      const account = await byAccount.consume(accountKey(email, ip));
      if (!account.allowed) throw tooMany(account.retryAfterSeconds);
    },
    /** A right password: the account's count starts again. */
    async recordSuccess(email: string, ip: string): Promise<void> {
      await byAccount.reset(accountKey(email, ip));
    },
  };
}

export type SignInThrottle = ReturnType<typeof createSignInThrottle>;
