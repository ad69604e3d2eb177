import session from 'express-session';
import { ConnectSessionKnexStore } from 'connect-session-knex';
import { Knex } from 'knex';
import { RequestHandler } from 'express';

const FOURTEEN_DAYS_MS = 14 * 24 * 3600 * 1000;

/** Sessions kept in MariaDB, so a restart of the server signs nobody out. */
export function createSessionMiddleware(db: Knex, secret: string, cleanupIntervalMs: number) {
  const store = new ConnectSessionKnexStore({ knex: db, tableName: 'sessions', createTable: false, cleanupInterval: cleanupIntervalMs });
  const middleware: RequestHandler = session({
    name: 'commonwort.sid',
    secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: undefined,
    cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: FOURTEEN_DAYS_MS },
  });
  /** Stops the store's cleanup timer so the process can exit. */
  const close = () => clearTimeout(store.nextDbCleanup);
  return { middleware, close };
}
