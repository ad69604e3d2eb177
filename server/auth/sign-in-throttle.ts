import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { AppError } from '../errors/app-error';

/** Limits on failed sign-ins: per account and address, and per address over all accounts. */
export interface SignInThrottleLimits {
  perAccountAndAddress: number;
  perAddress: number;
  windowSeconds: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInThrottleLimits = { perAccountAndAddress: 5, perAddress: 50, windowSeconds: 15 * 60 };

function tooMany(retryMs: number): AppError {
  const retryAfterSeconds = Math.max(1, Math.ceil(retryMs / 1000));
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return new AppError(
    'too-many-attempts',
    `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
    429,
    undefined,
    retryAfterSeconds,
  );
}

/** Counts failed sign-ins and refuses further tries with 429 and a retry time. */
export function createSignInThrottle(limits: SignInThrottleLimits = DEFAULT_SIGN_IN_LIMITS) {
  const byAccount = new RateLimiterMemory({ points: limits.perAccountAndAddress, duration: limits.windowSeconds });
  const byAddress = new RateLimiterMemory({ points: limits.perAddress, duration: limits.windowSeconds });
  const accountKey = (email: string, ip: string) => `${email.toLowerCase()}|${ip}`;

  return {
    /** Throws 429 when either limit is already used up. */
    async assertAllowed(email: string, ip: string): Promise<void> {
      for (const [limiter, key, max] of [
        [byAccount, accountKey(email, ip), limits.perAccountAndAddress],
        [byAddress, ip, limits.perAddress],
      ] as const) {
        const state = await limiter.get(key);
        if (state && state.consumedPoints >= max) throw tooMany(state.msBeforeNext);
      }
    },
    async recordFailure(email: string, ip: string): Promise<void> {
      await Promise.all([byAccount.penalty(accountKey(email, ip)), byAddress.penalty(ip)]).catch((res: RateLimiterRes) => res);
    },
    async recordSuccess(email: string, ip: string): Promise<void> {
      await byAccount.delete(accountKey(email, ip));
    },
  };
}

export type SignInThrottle = ReturnType<typeof createSignInThrottle>;
