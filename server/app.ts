import express, { Express } from 'express';
import { Knex } from 'knex';
import pino, { Logger } from 'pino';
import { mountFeatureApis } from './api-routes';
import { createAppServices } from './app-services';
import { createSessionMiddleware, csrfProtection, SignInThrottleLimits } from './auth';
import { CATALOGUE_IMPORT_BODY_LIMIT, CATALOGUE_IMPORT_PATH } from './catalogue/catalogue.routes';
import { createClientRouter } from './client/serve-client';
import { Config } from './config';
import { createDuesRenewalsService } from './dues';
import { apiNotFound, errorMiddleware } from './errors/error-middleware';
import { createHealthRouter } from './health/health.routes';
import { startHousekeeping } from './housekeeping/housekeeping';
import { mountApi } from './http/api-mount';
import { requestLogger } from './http/request-logger';
import { responseCompression } from './http/response-compression';
import { securityHeaders } from './http/security-headers';
import { wellFormedBody } from './http/well-formed-body';
import { bookingsRepository } from './bookings';
import { createMailSender, createOutboxDispatcher } from './mail';
import { RateLimit } from './rate-limits/rate-limiter';
import { createPushRouter, DEFAULT_PUSH_RATE_LIMIT, PushRateLimit } from './readings';
import { AppJobs, appJobSchedule } from './scheduler/app-jobs';
import { processHolderId, startScheduler } from './scheduler/scheduler';

export interface AppDeps {
  config: Config;
  db: Knex;
  signInLimits?: SignInThrottleLimits;
  /** Cap per address on each public route that looks up a token or hashes a password (reset, invitation acceptance). */
  publicRequestLimit?: RateLimit;
  /** Cap on logger pushes per token and address. */
  pushRateLimit?: PushRateLimit;
  /** Interval of the sweep of expired sessions and counters; 0 turns it off (tests). */
  sessionCleanupMs?: number;
  /** Runs the outbox, renewal and reminder jobs inside this process (the server does; most tests call them directly). */
  runScheduler?: boolean;
  logger?: Logger;
}

/** The app and what must be closed with it. */
export interface CreatedApp {
  app: Express;
  /** The scheduled work, also callable directly. */
  jobs: AppJobs;
  close(): void;
}

export const DEFAULT_PUBLIC_REQUEST_LIMIT: RateLimit = { points: 20, windowSeconds: 15 * 60 };

/** Builds the Express app: API routers under /api, the built client, one error handler last. */
export function createApp({ config, db, signInLimits, publicRequestLimit = DEFAULT_PUBLIC_REQUEST_LIMIT, pushRateLimit = DEFAULT_PUSH_RATE_LIMIT, sessionCleanupMs = 15 * 60 * 1000, runScheduler = false, ...deps }: AppDeps): CreatedApp {
  const app = express();
  const logger = deps.logger ?? pino({ level: config.logLevel });
  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');
  app.use(requestLogger(logger));
  app.use(securityHeaders());
  app.use(responseCompression());
  app.use(CATALOGUE_IMPORT_PATH, express.json({ limit: CATALOGUE_IMPORT_BODY_LIMIT }));
  app.use('/api', express.json({ limit: '100kb' }), wellFormedBody);

  const services = createAppServices(config, db, signInLimits);

  // Health first: it answers (database down) even when sessions cannot be read.
  mountApi(app, '/api/health', createHealthRouter(db));
  // Loggers push with a token of their own: no session, no CSRF, so this sits before both.
  mountApi(app, '/api/readings/push', createPushRouter(services.pushTokens, db, pushRateLimit));
  app.use('/api', createSessionMiddleware(db, config.sessionSecret), services.passport.session(), csrfProtection);
  mountFeatureApis(app, { config, db, services, publicRequestLimit });
  app.use('/api', apiNotFound);
  app.use(createClientRouter(config.clientDist));
  app.use(errorMiddleware);

  const holder = processHolderId();
  const jobs: AppJobs = {
    outbox: createOutboxDispatcher({ db, send: createMailSender(config.smtp), holder }),
    dues: createDuesRenewalsService({ ...services.duesDeps, upcomingBookings: bookingsRepository.countUpcomingForUser }),
    bookingReminders: services.bookingNotices,
  };
  const scheduler = runScheduler ? startScheduler({ db, holder, logger, jobs: appJobSchedule(jobs, config.mailDispatchSeconds) }) : null;
  const stopHousekeeping = startHousekeeping(db, sessionCleanupMs, (err) => logger.warn({ err }, 'housekeeping failed; trying again later'));
  return {
    app,
    jobs,
    close: () => {
      scheduler?.stop();
      stopHousekeeping();
    },
  };
}
