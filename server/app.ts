import { responseCompression } from './http/response-compression';
import express, { Express } from 'express';
import { Knex } from 'knex';
import pino, { Logger } from 'pino';
import {
  createAuthRouter,
  createAuthService,
  createPassport,
  createPasswordHasher,
  createSessionMiddleware,
  createSignInThrottle,
  csrfProtection,
  SignInThrottleLimits,
} from './auth';
import { createClientRouter } from './client/serve-client';
import { Config } from './config';
import { apiNotFound, errorMiddleware } from './errors/error-middleware';
import { createHealthRouter } from './health/health.routes';
import { startHousekeeping } from './housekeeping/housekeeping';
import { mountApi } from './http/api-mount';
import { requestLogger } from './http/request-logger';
import { securityHeaders } from './http/security-headers';
import { wellFormedBody } from './http/well-formed-body';
import { createInvitationsRouter, createInvitationsService } from './invitations';
import { createMembersRouter, createMembersService } from './members';
import { createPasswordResetsRouter, createPasswordResetsService } from './password-resets';
import { createBrewhouseRouter } from './brewhouse/brewhouse.routes';
import { createBrewhouseService } from './brewhouse/brewhouse.service';
import { CATALOGUE_IMPORT_BODY_LIMIT, CATALOGUE_IMPORT_PATH, createCatalogueRouter } from './catalogue/catalogue.routes';
import { createCatalogueService } from './catalogue/catalogue.service';
import { createPreferencesRouter } from './preferences/preferences.routes';
import { createPreferencesService } from './preferences/preferences.service';
import { limitPerAddress } from './rate-limits/limit-per-address';
import { RateLimit } from './rate-limits/rate-limiter';
import { createProfileRouter, createProfileService } from './profile';
import { createRecipesRouter, createRecipesService } from './recipes';
import { createStylesRouter } from './styles/styles.routes';
import { createStylesService } from './styles/styles.service';
import { createLabRouter } from './lab/lab.routes';
import { createToleranceClassesService } from './lab/tolerance-classes.service';
import { createReferenceTablesRouter, createReferenceTablesService } from './reference-tables';
import { createDistillateAnalysesService } from './lab/distillate-analyses.service';
import { createStrengthCheckRouter, createStrengthCheckService } from './strength-check';
import { createFermentationRouter } from './fermentation/fermentation.routes';
import { createBatchesRouter, createBatchesService } from './batches';
import { createBatchReadingsRouter, createPushRouter, createPushTokensService, createReadingsRouter, createReadingsService, DEFAULT_PUSH_RATE_LIMIT, PushRateLimit } from './readings';
import { createDuesLedgerService, createDuesPaymentsService, createDuesRenewalsService, createDuesRouter, createDuesStanding, createStripeGateway } from './dues';
import { createMailRouter, createMailSender, createOutboxDispatcher, createOutboxService } from './mail';
import { AppJobs, appJobSchedule } from './scheduler/app-jobs';
import { processHolderId, startScheduler } from './scheduler/scheduler';
import { bookingsRepository, createBookingFeedService, createBookingNotices, createBookingsRouter, createBookingsService } from './bookings';
import { createKitRouter, createKitService } from './kit';
import { createBrewPlanReads, createBrewPlanRouter, createBrewPlanWrites } from './brew-plan';
import { createProductionReportService, createReportsRouter } from './reports';
import { createStockDrawService, createStockRouter, createStockService } from './stock';

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

  const hasher = createPasswordHasher(config.bcryptCost);
  const auth = createAuthService(db, hasher);
  const passport = createPassport(auth);
  const invitations = createInvitationsService({ db, hasher, publicUrl: config.publicUrl });
  const resets = createPasswordResetsService({ db, hasher, publicUrl: config.publicUrl });

  const recipes = createRecipesService(db);
  const pushTokens = createPushTokensService(db);
  const readings = createReadingsService(db);

  // Health first: it answers (database down) even when sessions cannot be read.
  mountApi(app, '/api/health', createHealthRouter(db));
  // Loggers push with a token of their own: no session, no CSRF, so this sits before both.
  mountApi(app, '/api/readings/push', createPushRouter(pushTokens, db, pushRateLimit));
  app.use('/api', createSessionMiddleware(db, config.sessionSecret), passport.session(), csrfProtection);
  mountApi(app, '/api/auth', createAuthRouter({ auth, passport, throttle: createSignInThrottle(db, signInLimits), coopTimeZone: config.coopTimeZone }));
  mountApi(app, '/api/invitations', createInvitationsRouter(invitations, limitPerAddress(db, 'invitation-acceptance', publicRequestLimit)));
  mountApi(app, '/api/password-resets', createPasswordResetsRouter(resets, limitPerAddress(db, 'password-reset', publicRequestLimit)));
  mountApi(app, '/api/members', createMembersRouter(createMembersService(db, invitations), resets));
  mountApi(app, '/api/preferences', createPreferencesRouter(createPreferencesService(db)));
  mountApi(app, '/api/profile', createProfileRouter(createProfileService({ db, hasher })));
  mountApi(app, '/api/ingredients', createCatalogueRouter(createCatalogueService(db)));
  mountApi(app, '/api/styles', createStylesRouter(createStylesService(db)));
  const brewhouse = createBrewhouseService(db);
  mountApi(app, '/api/brewhouse', createBrewhouseRouter(brewhouse));
  mountApi(app, '/api/recipes', createRecipesRouter(recipes));
  mountApi(app, '/api/batches', createBatchesRouter(createBatchesService(db, recipes), db));
  mountApi(app, '/api/batches', createBatchReadingsRouter(readings, pushTokens, db, config.coopTimeZone));
  mountApi(app, '/api/readings', createReadingsRouter(readings));
  const duesDeps = { db, gateway: createStripeGateway(config.stripe), coopTimeZone: config.coopTimeZone, publicUrl: config.publicUrl };
  const duesLedger = createDuesLedgerService({ db, coopTimeZone: config.coopTimeZone, testMode: config.stripe.testMode });
  mountApi(app, '/api/dues', createDuesRouter(duesLedger, createDuesPaymentsService(duesDeps)));
  mountApi(app, '/api/admin/mail', createMailRouter(createOutboxService(db)));
  mountApi(app, '/api/kit', createKitRouter(createKitService(db)));
  const bookingNotices = createBookingNotices({ db, coopTimeZone: config.coopTimeZone, publicUrl: config.publicUrl });
  const duesStanding = createDuesStanding({ db, coopTimeZone: config.coopTimeZone });
  const bookings = createBookingsService({ db, coopTimeZone: config.coopTimeZone, duesStanding: duesStanding.standingOf, notices: bookingNotices });
  mountApi(app, '/api/bookings', createBookingsRouter(bookings, createBookingFeedService(db, config.publicUrl)));
  const brewPlanWrites = createBrewPlanWrites({ db, coopTimeZone: config.coopTimeZone, recipes, bookings, notices: bookingNotices });
  mountApi(app, '/api/brew-plan', createBrewPlanRouter(createBrewPlanReads(db, config.coopTimeZone, recipes), brewPlanWrites));
  const referenceTables = createReferenceTablesService(db);
  const toleranceClasses = createToleranceClassesService(db);
  const distillateAnalyses = createDistillateAnalysesService(db, referenceTables);
  mountApi(app, '/api/reference-tables', createReferenceTablesRouter(referenceTables));
  mountApi(app, '/api/lab', createLabRouter(toleranceClasses, distillateAnalyses));
  mountApi(app, '/api/batches/:batchId/strength', createStrengthCheckRouter(createStrengthCheckService(db, toleranceClasses, distillateAnalyses.latest)));
  mountApi(app, '/api/batches/:batchId/fermentation', createFermentationRouter(db));
  mountApi(app, '/api/stock', createStockRouter(createStockService(db, config.coopTimeZone), createStockDrawService(db), db, config.coopTimeZone));
  mountApi(app, '/api/reports', createReportsRouter(createProductionReportService(db, config.coopTimeZone)));
  app.use('/api', apiNotFound);
  app.use(createClientRouter(config.clientDist));
  app.use(errorMiddleware);

  const holder = processHolderId();
  const jobs: AppJobs = {
    outbox: createOutboxDispatcher({ db, send: createMailSender(config.smtp), holder }),
    dues: createDuesRenewalsService({ ...duesDeps, upcomingBookings: bookingsRepository.countUpcomingForUser }),
    bookingReminders: bookingNotices,
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
