import { RequestHandler } from 'express';
import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';
import { AppError } from '../errors/app-error';

/** How many anonymous requests of one kind an address may make in a window. */
export interface PublicRequestLimit {
  points: number;
  windowSeconds: number;
}

export const DEFAULT_PUBLIC_REQUEST_LIMIT: PublicRequestLimit = { points: 20, windowSeconds: 15 * 60 };

/** Caps anonymous requests per address (password-reset requests and completions), answering 429 with a retry time. */
export function createPublicRequestLimit(limit: PublicRequestLimit = DEFAULT_PUBLIC_REQUEST_LIMIT): RequestHandler {
  const limiter = new RateLimiterMemory({ points: limit.points, duration: limit.windowSeconds });
  return async (req, _res, next) => {
    try {
      await limiter.consume(req.ip ?? 'unknown');
      next();
    } catch (refusal) {
      if (!(refusal instanceof RateLimiterRes)) return next(refusal);
      const retryAfterSeconds = Math.max(1, Math.ceil(refusal.msBeforeNext / 1000));
      next(new AppError('too-many-requests', `Too many requests from this address. Try again in ${Math.ceil(retryAfterSeconds / 60)} min.`, 429, undefined, retryAfterSeconds));
    }
  };
}
