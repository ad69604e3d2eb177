import { RequestHandler } from 'express';
import { Knex } from 'knex';
import { AppError } from '../errors/app-error';
import { createRateLimiter, RateLimit } from './rate-limiter';

/** The 429 sent when a limit is used up, with the wait in seconds (also as Retry-After). */
export function tooManyRequests(retryAfterSeconds: number, what = 'requests from this address'): AppError {
  const minutes = Math.ceil(retryAfterSeconds / 60);
  return new AppError('too-many-requests', `Too many ${what}. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, 429, undefined, retryAfterSeconds);
}

/**
 * Middleware capping requests of one kind (`name`) per client address, counted in the database.
 * Put it right after the route's access guard, before any costly work.
 */
export function limitPerAddress(db: Knex, name: string, limit: RateLimit): RequestHandler {
  const limiter = createRateLimiter(db, name, limit);
  return async (req, _res, next) => {
    const decision = await limiter.consume(req.ip ?? 'unknown');
    if (!decision.allowed) throw tooManyRequests(decision.retryAfterSeconds);
    next();
  };
}
