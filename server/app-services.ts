import { Knex } from 'knex';
import { createAuthService, createPassport, createPasswordHasher, createSignInThrottle, SignInThrottleLimits } from './auth';
import { createBatchesService } from './batches';
import { createBookingFeedService, createBookingNotices, createBookingsService } from './bookings';
import { createBrewhouseService } from './brewhouse/brewhouse.service';
import { createBrewPlanReads, createBrewPlanWrites } from './brew-plan';
import { createCatalogueService } from './catalogue/catalogue.service';
import { Config } from './config';
import { createDuesLedgerService, createDuesPaymentsService, createDuesStanding, createStripeGateway } from './dues';
import { createInvitationsService } from './invitations';
import { createKitService } from './kit';
import { createDistillateAnalysesService } from './lab/distillate-analyses.service';
import { createToleranceClassesService } from './lab/tolerance-classes.service';
import { createOutboxService } from './mail';
import { createMembersService } from './members';
import { createPasswordResetsService } from './password-resets';
import { createPreferencesService } from './preferences/preferences.service';
import { createProfileService } from './profile';
import { createPushTokensService, createReadingsService } from './readings';
import { createRecipesService } from './recipes';
import { createReferenceTablesService } from './reference-tables';
import { createProductionReportService } from './reports';
import { createStockDrawService, createStockService } from './stock';
import { createStrengthCheckService } from './strength-check';
import { createStylesService } from './styles/styles.service';

/**
 * Every feature's service, built once per app over one database and configuration. Services that
 * others depend on (recipes, bookings and their notices, the reference tables) are built once and shared.
 */
export function createAppServices(config: Config, db: Knex, signInLimits?: SignInThrottleLimits) {
  const { coopTimeZone, publicUrl } = config;
  const hasher = createPasswordHasher(config.bcryptCost);
  const auth = createAuthService(db, hasher);
  const invitations = createInvitationsService({ db, hasher, publicUrl });
  const recipes = createRecipesService(db);
  const duesDeps = { db, gateway: createStripeGateway(config.stripe), coopTimeZone, publicUrl };
  const bookingNotices = createBookingNotices({ db, coopTimeZone, publicUrl });
  const duesStanding = createDuesStanding({ db, coopTimeZone });
  const bookings = createBookingsService({ db, coopTimeZone, duesStanding: duesStanding.standingOf, notices: bookingNotices });
  const referenceTables = createReferenceTablesService(db);
  const toleranceClasses = createToleranceClassesService(db);
  const distillateAnalyses = createDistillateAnalysesService(db, referenceTables);
  return {
    auth,
    passport: createPassport(auth),
    signInThrottle: createSignInThrottle(db, signInLimits),
    invitations,
    resets: createPasswordResetsService({ db, hasher, publicUrl }),
    members: createMembersService(db, invitations),
    preferences: createPreferencesService(db),
    profile: createProfileService({ db, hasher }),
    catalogue: createCatalogueService(db),
    styles: createStylesService(db),
    brewhouse: createBrewhouseService(db),
    recipes,
    batches: createBatchesService(db, recipes),
    pushTokens: createPushTokensService(db),
    readings: createReadingsService(db),
    /** What the dues services share; the renewal job is built from it too. */
    duesDeps,
    duesLedger: createDuesLedgerService({ db, coopTimeZone, testMode: config.stripe.testMode }),
    duesPayments: createDuesPaymentsService(duesDeps),
    outbox: createOutboxService(db),
    kit: createKitService(db),
    bookingNotices,
    bookings,
    bookingFeed: createBookingFeedService(db, publicUrl),
    brewPlanReads: createBrewPlanReads(db, coopTimeZone, recipes),
    brewPlanWrites: createBrewPlanWrites({ db, coopTimeZone, recipes, bookings, notices: bookingNotices }),
    referenceTables,
    toleranceClasses,
    distillateAnalyses,
    strengthCheck: createStrengthCheckService(db, toleranceClasses, distillateAnalyses.latest),
    stock: createStockService(db, coopTimeZone),
    stockDraw: createStockDrawService(db),
    productionReport: createProductionReportService(db, coopTimeZone),
  };
}

export type AppServices = ReturnType<typeof createAppServices>;
