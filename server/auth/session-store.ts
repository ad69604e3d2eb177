import { SessionData, Store } from 'express-session';
import { Knex } from 'knex';
import { sessionsRepository, TOUCH_STEP_MS } from './sessions.repository';

type Callback<T = void> = (err?: unknown, value?: T | null) => void;

const DEFAULT_LIFETIME_MS = 24 * 3600 * 1000;

function expiryOf(sess: SessionData): Date {
  const expires = sess.cookie?.expires;
  return expires ? new Date(expires) : new Date(Date.now() + DEFAULT_LIFETIME_MS);
}

/**
 * express-session's store over the `sessions` table. Every database failure goes to the callback
 * (and so to the error middleware as a 503); nothing here can reject unhandled or stay broken
 * after an outage, because no state is kept between calls.
 */
export class DatabaseSessionStore extends Store {
  constructor(private readonly db: Knex) {
    super();
  }

  override get(sid: string, callback: Callback<SessionData>): void {
    sessionsRepository.find(this.db, sid, new Date()).then((sess) => callback(null, sess), callback);
  }

  override set(sid: string, sess: SessionData, callback?: Callback): void {
    sessionsRepository.save(this.db, sid, sess, expiryOf(sess)).then(() => callback?.(), (err) => callback?.(err));
  }

  override touch(sid: string, sess: SessionData, callback?: Callback): void {
    const expiry = expiryOf(sess);
    // Read with this request and less than a step behind: nothing to write, and no round trip.
    if (sess.storedExpiryMs !== undefined && expiry.getTime() - sess.storedExpiryMs < TOUCH_STEP_MS) {
      callback?.();
      return;
    }
    sessionsRepository.touch(this.db, sid, expiryOf(sess)).then(() => callback?.(), (err) => callback?.(err));
  }

  override destroy(sid: string, callback?: Callback): void {
    sessionsRepository.remove(this.db, sid).then(() => callback?.(), (err) => callback?.(err));
  }
}
