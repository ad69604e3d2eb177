import { randomBytes, timingSafeEqual } from 'node:crypto';
import { Request, RequestHandler, Response } from 'express';
import { forbidden } from '../errors/app-error';

/** Names Angular's HttpClient uses by default for its XSRF cookie and header. */
export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Gives the session a token (new after sign-in) and mirrors it in a cookie the client can read. */
export function issueCsrfToken(req: Request, res: Response, renew = false): void {
  if (renew || !req.session.csrfToken) req.session.csrfToken = randomBytes(24).toString('base64url');
  res.cookie(CSRF_COOKIE, req.session.csrfToken, { sameSite: 'lax', secure: req.secure, httpOnly: false, path: '/' });
}

function tokensMatch(expected: string | undefined, sent: string | undefined): boolean {
  if (!expected || !sent) return false;
  const a = Buffer.from(expected);
  const b = Buffer.from(sent);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Synchroniser-token check: every state-changing request must echo the session's token in the header. */
export const csrfProtection: RequestHandler = (req, res, next) => {
  if (SAFE_METHODS.has(req.method)) {
    issueCsrfToken(req, res);
    return next();
  }
  if (!tokensMatch(req.session.csrfToken, req.get(CSRF_HEADER))) {
    return next(forbidden('The request is missing its security token. Reload the page and try again.'));
  }
  next();
};
