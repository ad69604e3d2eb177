import { Express } from 'express';
import { Knex } from 'knex';
import { AppServices } from './app-services';
import { createAuthRouter } from './auth';
import { createBatchesRouter } from './batches';
import { createBookingsRouter } from './bookings';
import { createBrewhouseRouter } from './brewhouse/brewhouse.routes';
import { createBrewPlanRouter } from './brew-plan';
import { createCatalogueRouter } from './catalogue/catalogue.routes';
import { Config } from './config';
import { createDuesRouter } from './dues';
import { createFermentationRouter } from './fermentation/fermentation.routes';
import { mountApi } from './http/api-mount';
import { createInvitationsRouter } from './invitations';
import { createKitRouter } from './kit';
import { createLabRouter } from './lab/lab.routes';
import { createMailRouter } from './mail';
import { createMembersRouter } from './members';
import { createPasswordResetsRouter } from './password-resets';
import { createPreferencesRouter } from './preferences/preferences.routes';
import { createProfileRouter } from './profile';
import { limitPerAddress } from './rate-limits/limit-per-address';
import { RateLimit } from './rate-limits/rate-limiter';
import { createBatchReadingsRouter, createReadingsRouter } from './readings';
import { createRecipesRouter } from './recipes';
import { createReferenceTablesRouter } from './reference-tables';
import { createReportsRouter } from './reports';
import { createStockRouter } from './stock';
import { createStrengthCheckRouter } from './strength-check';
import { createStylesRouter } from './styles/styles.routes';

export interface FeatureApiDeps {
  config: Config;
  db: Knex;
  services: AppServices;
  /** Cap per address on each public route that looks up a token or hashes a password. */
  publicRequestLimit: RateLimit;
}

/** The API's URL map: every feature router that sits behind the session and CSRF check, under its path. */
export function mountFeatureApis(app: Express, { config, db, services: s, publicRequestLimit }: FeatureApiDeps): void {
  const zone = config.coopTimeZone;
  mountApi(app, '/api/auth', createAuthRouter({ auth: s.auth, passport: s.passport, throttle: s.signInThrottle, coopTimeZone: zone }));
  mountApi(app, '/api/invitations', createInvitationsRouter(s.invitations, limitPerAddress(db, 'invitation-acceptance', publicRequestLimit)));
  mountApi(app, '/api/password-resets', createPasswordResetsRouter(s.resets, limitPerAddress(db, 'password-reset', publicRequestLimit)));
  mountApi(app, '/api/members', createMembersRouter(s.members, s.resets));
  mountApi(app, '/api/preferences', createPreferencesRouter(s.preferences));
  mountApi(app, '/api/profile', createProfileRouter(s.profile));
  mountApi(app, '/api/ingredients', createCatalogueRouter(s.catalogue));
  mountApi(app, '/api/styles', createStylesRouter(s.styles));
  mountApi(app, '/api/brewhouse', createBrewhouseRouter(s.brewhouse));
  mountApi(app, '/api/recipes', createRecipesRouter(s.recipes));
  mountApi(app, '/api/batches', createBatchesRouter(s.batches, db));
  mountApi(app, '/api/batches', createBatchReadingsRouter(s.readings, s.pushTokens, db, zone));
  mountApi(app, '/api/readings', createReadingsRouter(s.readings));
  mountApi(app, '/api/dues', createDuesRouter(s.duesLedger, s.duesPayments));
  mountApi(app, '/api/admin/mail', createMailRouter(s.outbox));
  mountApi(app, '/api/kit', createKitRouter(s.kit));
  mountApi(app, '/api/bookings', createBookingsRouter(s.bookings, s.bookingFeed));
  mountApi(app, '/api/brew-plan', createBrewPlanRouter(s.brewPlanReads, s.brewPlanWrites));
  mountApi(app, '/api/reference-tables', createReferenceTablesRouter(s.referenceTables));
  mountApi(app, '/api/lab', createLabRouter(s.toleranceClasses, s.distillateAnalyses));
  mountApi(app, '/api/batches/:batchId/strength', createStrengthCheckRouter(s.strengthCheck));
  mountApi(app, '/api/batches/:batchId/fermentation', createFermentationRouter(db));
  mountApi(app, '/api/stock', createStockRouter(s.stock, s.stockDraw, db, zone));
  mountApi(app, '/api/reports', createReportsRouter(s.productionReport));
}
