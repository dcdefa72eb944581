import { indexPage } from './client/index-page';
import { loansRouter, printLightRouter } from './routes/loans';
import { placeLabelsRouter, printLabelsRouter } from './routes/labels';
import { bulkMovementsRouter, placeHoldingsRouter, printMovementsRouter } from './routes/movements';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { createPassport } from './auth/passport';
import { regenerateOnRoleChange } from './auth/role-change';
import { createSessionStore } from './auth/session-store';
import type { AppContext } from './context';
import { csrfProtection } from './middleware/csrf';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { assetsRouter } from './routes/assets';
import { auditRouter } from './routes/audit';
import { chemistryRouter } from './routes/chemistry';
import { printingLogRouter, solutionBatchDetailRouter } from './routes/chemistry-records';
import { checklistsRouter } from './routes/checklists';
import { conditionReportsRouter, conditionRouter } from './routes/condition';
import { demoRouter } from './routes/demo';
import { environmentAlertsRouter, placeEnvironmentRouter } from './routes/environment';
import { fixityChecksRouter } from './routes/fixity-checks';
import { healthRouter } from './routes/health';
import { importsRouter } from './routes/imports';
import { overviewRouter } from './routes/overview';
import { sourcesRouter } from './routes/sources';
import { compressedAssets } from './middleware/compressed-assets';
import { catalogueJsonLdRouter, printJsonLdRouter } from './routes/linked-data';
import { iiifRouter } from './routes/iiif';
import { printAssetsRouter } from './routes/print-assets';
import { printManifestRouter } from './routes/print-manifest';
import { printsCsvRouter, printsRouter } from './routes/prints';
import { printReportRouter } from './routes/print-report';
import {
  locationsRouter,
  negativesRouter,
  papersRouter,
  solutionBatchesRouter,
} from './routes/references';
import { requestLogger } from './logging/request-logger';
import { invitationsRouter } from './routes/invitations';
import { outboxRouter } from './routes/outbox';
import { passwordResetsRouter } from './routes/password-resets';
import { routeMatcher } from './routes/route-list';
import { savedSearchesRouter } from './routes/saved-searches';
import { searchIndexRouter } from './routes/search-index';
import { sessionRouter } from './routes/session';
import { settingsRouter } from './routes/settings';
import {
  alertsRouter,
  cohortsRouter,
  printToneRouter,
  toneChecksRouter,
  toneRoundsRouter,
  toneWatchRouter,
} from './routes/tone';
import { usersRouter } from './routes/users';
import { writesSettled } from './db/write-transaction';

const SESSION_HOURS = 12;
/** Routes that take only a few small fields get a small body limit; the rest 1 MB. */
const SMALL_BODY_ROUTES = [
  '/api/session',
  '/api/users',
  '/api/invitations',
  '/api/password-resets',
];

/** `TRUST_PROXY`: a hop count, `true`, or addresses/subnets as Express reads them. */
function trustProxyValue(value: string): string | number | boolean {
  if (/^\d+$/.test(value)) return Number(value);
  return value === 'true' ? true : value;
}

export interface App {
  app: Express;
  /**
   * Stops the session store's expiry timer and the mailer (its retry timer and the
   * built-in SMTP server); the database stays open for the caller.
   */
  close: () => Promise<void>;
}

/** Builds the whole HTTP app on an open, migrated database; does not listen. */
export function createApp(ctx: AppContext, options: { clientDir?: string } = {}): App {
  const app = express();
  const passport = createPassport(ctx.config.passwordCost);
  const store = createSessionStore(ctx.sequelize);

  app.set('trust proxy', trustProxyValue(ctx.config.trustProxy));
  app.disable('x-powered-by');
  app.use(requestLogger(ctx.logger, routeMatcher(app)));
  app.use(
    helmet({
      contentSecurityPolicy: {
        // Plain HTTP on a LAN host must keep working (no forced upgrade to https).
        directives: { upgradeInsecureRequests: null, imgSrc: ["'self'", 'data:', 'blob:'] },
      },
    }),
  );
  const clientDir = options.clientDir ?? resolve('dist/client');
  serveClientAssets(app, clientDir);
  app.use(SMALL_BODY_ROUTES, express.json({ limit: '8kb' }));
  app.use(express.json({ limit: '1mb' }));
  app.use(
    session({
      name: 'printwarden.sid',
      secret: ctx.config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        // Behind a TLS proxy set TRUST_PROXY so Express sees https and sends the cookie.
        secure: ctx.config.production,
        maxAge: SESSION_HOURS * 3600 * 1000,
      },
    }),
  );
  app.use(passport.session());
  app.use(regenerateOnRoleChange);
  app.use('/api', csrfProtection);

  app.use('/api/health', healthRouter());
  app.use('/api/demo', demoRouter(ctx));
  app.use('/api/session', sessionRouter(ctx, passport));
  app.use('/api/prints.csv', printsCsvRouter(ctx));
  app.use('/api/prints.jsonld', catalogueJsonLdRouter());
  app.use('/api/prints', printJsonLdRouter());
  app.use('/api/prints', conditionRouter(ctx));
  app.use('/api/condition-reports', conditionReportsRouter(ctx));
  app.use('/api/prints', printReportRouter(ctx));
  app.use('/api/prints/:id/assets', printAssetsRouter(ctx));
  app.use('/api/prints/:id/manifest.json', printManifestRouter());
  app.use('/api/prints', printToneRouter(ctx));
  app.use('/api/prints', printLabelsRouter(ctx));
  app.use('/api/prints', printMovementsRouter(ctx));
  app.use('/api/prints', printLightRouter(ctx));
  app.use('/api/prints', printsRouter(ctx));
  app.use('/api/movements', bulkMovementsRouter(ctx));
  app.use('/api/loans', loansRouter(ctx));
  app.use('/api/assets', assetsRouter(ctx));
  app.use('/api/iiif', iiifRouter(ctx));
  app.use('/api/fixity-checks', fixityChecksRouter(ctx));
  app.use('/api/papers', papersRouter(ctx));
  app.use('/api/negatives', printingLogRouter());
  app.use('/api/negatives', negativesRouter(ctx));
  app.use('/api/locations', placeHoldingsRouter(ctx));
  app.use('/api/locations', placeEnvironmentRouter(ctx));
  app.use('/api/locations', placeLabelsRouter(ctx));
  app.use('/api/locations', locationsRouter(ctx));
  app.use('/api/environment-alerts', environmentAlertsRouter(ctx));
  app.use('/api/solution-batches', solutionBatchDetailRouter());
  app.use('/api/solution-batches', solutionBatchesRouter(ctx));
  app.use('/api/chemistry', chemistryRouter(ctx));
  app.use('/api/audit', auditRouter());
  app.use('/api/tone-checks', toneChecksRouter(ctx));
  app.use('/api/tone-watch', toneWatchRouter());
  app.use('/api/tone-rounds', toneRoundsRouter());
  app.use('/api/alerts', alertsRouter(ctx));
  app.use('/api/cohorts', cohortsRouter(ctx));
  app.use('/api/settings', settingsRouter(ctx));
  app.use('/api/outbox', outboxRouter(ctx));
  app.use('/api/users', usersRouter(ctx));
  app.use('/api/invitations', invitationsRouter(ctx));
  app.use('/api/password-resets', passwordResetsRouter(ctx));
  app.use('/api/saved-searches', savedSearchesRouter());
  app.use('/api/checklists', checklistsRouter(ctx));
  app.use('/api/search-index', searchIndexRouter(ctx));
  app.use('/api/imports', importsRouter(ctx));
  app.use('/api/overview', overviewRouter(ctx));
  app.use('/api/sources', sourcesRouter(ctx));
  app.use('/api', apiNotFound);

  serveIndexPage(app, clientDir);
  app.use(errorHandler);

  return {
    app,
    close: async () => {
      store.stopExpiringSessions();
      await writesSettled(ctx.sequelize);
      await ctx.mailer.close();
    },
  };
}

const hasClient = (clientDir: string) => existsSync(join(clientDir, 'index.html'));

/**
 * The built client's files, ahead of sessions: a script or font needs no session, and through
 * the session store each one depended on the database (in one Search load, a page's files and
 * its API answers stalled together for about half a second).
 */
function serveClientAssets(app: Express, clientDir: string): void {
  if (!hasClient(clientDir)) return;
  app.use(compressedAssets(clientDir));
  app.use('/assets', express.static(join(clientDir, 'assets'), { index: false, maxAge: '1h' }));
}

/** Every other non-API path is answered by the client's index page (and its preloads). */
function serveIndexPage(app: Express, clientDir: string): void {
  if (!hasClient(clientDir)) return;
  app.get('/{*splat}', indexPage(clientDir));
}
