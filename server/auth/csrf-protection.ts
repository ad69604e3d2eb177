import { randomBytes, timingSafeEqual } from 'node:crypto';
import { Request, RequestHandler, Response } from 'express';
import { forbidden } from '../errors/app-error';

/** Names Angular's HttpClient uses by default for its XSRF cookie and header. */
export const CSRF_COOKIE = 'XSRF-TOKEN';
export const CSRF_HEADER = 'x-xsrf-token';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{32}$/;

function newToken(): string {
  return randomBytes(24).toString('base64url');
}

/** The XSRF cookie the browser sent, when it is one of ours. */
function cookieToken(req: Request): string | undefined {
  for (const part of (req.headers.cookie ?? '').split(';')) {
    const [name, value] = part.trim().split('=');
    if (name === CSRF_COOKIE && value && TOKEN_PATTERN.test(value)) return value;
  }
  return undefined;
}

function setCookie(req: Request, res: Response, token: string): void {
  res.cookie(CSRF_COOKIE, token, { sameSite: 'lax', secure: req.secure, httpOnly: false, path: '/' });
}

/**
 * Gives the request a token and mirrors it in a cookie the client can read. A signed-in session
 * keeps its token server-side (new after sign-in); an anonymous visitor's lives only in the cookie
 * (double submit), so anonymous visits store nothing in the database.
 */
export function issueCsrfToken(req: Request, res: Response, renew = false): void {
  if (req.user) {
    if (renew || !req.session.csrfToken) req.session.csrfToken = newToken();
    setCookie(req, res, req.session.csrfToken);
    return;
  }
  const current = renew ? undefined : cookieToken(req);
  if (!current) setCookie(req, res, newToken());
}

function tokensMatch(expected: string | undefined, sent: string | undefined): boolean {
  if (!expected || !sent) return false;
  const a = Buffer.from(expected);
  const b = Buffer.from(sent);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** Every state-changing request must echo its token in the header, which another site cannot set. */
export const csrfProtection: RequestHandler = (req, res, next) => {
  if (SAFE_METHODS.has(req.method)) {
    issueCsrfToken(req, res);
    return next();
  }
  const expected = req.user ? req.session.csrfToken : cookieToken(req);
  if (!tokensMatch(expected, req.get(CSRF_HEADER))) {
    return next(forbidden('The request is missing its security token. Reload the page and try again.'));
  }
  next();
};
