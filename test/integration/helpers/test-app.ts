import { Knex } from 'knex';
import { createApp, CreatedApp } from '@server/app';
import { Config, loadConfig } from '@server/config';
import { createDb } from '@server/db';
import { SignInThrottleLimits } from '@server/auth';
import { PushRateLimit } from '@server/readings';
import { RateLimit } from '@server/rate-limits/rate-limiter';

/** Configuration of the test database prepared by `npm test`; a clear error when run some other way. */
export function testConfig(): Config {
  if (!process.env.DB_PASSWORD) {
    throw new Error('Integration tests need the private test database: run them with `npm test` (or `npm test -- --selectProjects integration`).');
  }
  // One trusted proxy hop: each ApiClient sends its own X-Forwarded-For address, so the per-address
  // limits (counted in the shared database) of one test never reach another.
  return { ...loadConfig(process.env), trustProxy: 1 };
}

/** The real app on the real test database; `close()` releases both. */
export interface TestApp extends CreatedApp {
  db: Knex;
  config: Config;
}

/** What a test may change in the app: its database, limits and environment. */
export interface TestAppOptions {
  db?: Knex;
  signInLimits?: SignInThrottleLimits;
  publicRequestLimit?: RateLimit;
  pushRateLimit?: PushRateLimit;
  env?: Record<string, string>;
}

export function createTestApp(options: TestAppOptions = {}): TestApp {
  const config = options.env ? { ...loadConfig({ ...process.env, ...options.env }), trustProxy: 1 } : testConfig();
  const db = options.db ?? createDb(config.db);
  const created = createApp({ config, db, signInLimits: options.signInLimits, publicRequestLimit: options.publicRequestLimit, pushRateLimit: options.pushRateLimit, sessionCleanupMs: 0 });
  return { ...created, db, config };
}

/**
 * The real app for one spec file: made before its tests, closed with its database after them.
 * The handle is filled in by `beforeAll`, so read it only inside hooks and tests.
 */
export function useTestApp(options: TestAppOptions = {}): TestApp {
  const handle = {} as TestApp;
  beforeAll(() => {
    Object.assign(handle, createTestApp(options));
  });
  afterAll(async () => {
    handle.close();
    await handle.db.destroy();
  });
  return handle;
}
