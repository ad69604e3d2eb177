import session from 'express-session';
import { Knex } from 'knex';
import { RequestHandler } from 'express';
import { DatabaseSessionStore } from './session-store';

const FOURTEEN_DAYS_MS = 14 * 24 * 3600 * 1000;

/**
 * Sessions kept in MariaDB, so a restart of the server signs nobody out. Only signed-in people get
 * a row: anonymous visitors carry their CSRF token in a cookie, never in a session.
 */
export function createSessionMiddleware(db: Knex, secret: string): RequestHandler {
  return session({
    name: 'commonwort.sid',
    secret,
    store: new DatabaseSessionStore(db),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: undefined,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: FOURTEEN_DAYS_MS },
  });
}
