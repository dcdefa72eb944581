import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { createPassport } from './auth/passport';
import { createSessionStore } from './auth/session-store';
import type { AppContext } from './context';
import { csrfProtection } from './middleware/csrf';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { auditRouter } from './routes/audit';
import { demoRouter } from './routes/demo';
import { healthRouter } from './routes/health';
import { printsCsvRouter, printsRouter } from './routes/prints';
import {
  locationsRouter,
  negativesRouter,
  papersRouter,
  solutionBatchesRouter,
} from './routes/references';
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

const SESSION_HOURS = 12;

export interface App {
  app: Express;
  /** Stops the session store's expiry timer; the database stays open for the caller. */
  close: () => void;
}

/** Builds the whole HTTP app on an open, migrated database; does not listen. */
export function createApp(ctx: AppContext, options: { clientDir?: string } = {}): App {
  const app = express();
  const passport = createPassport();
  const store = createSessionStore(ctx.sequelize);

  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        // Plain HTTP on a LAN host must keep working (no forced upgrade to https).
        directives: { upgradeInsecureRequests: null, imgSrc: ["'self'", 'data:', 'blob:'] },
      },
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(
    session({
      name: 'printwarden.sid',
      secret: ctx.config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', maxAge: SESSION_HOURS * 3600 * 1000 },
    }),
  );
  app.use(passport.session());
  app.use('/api', csrfProtection);

  app.use('/api/health', healthRouter());
  app.use('/api/demo', demoRouter(ctx));
  app.use('/api/session', sessionRouter(ctx, passport));
  app.use('/api/prints.csv', printsCsvRouter(ctx));
  app.use('/api/prints', printToneRouter(ctx));
  app.use('/api/prints', printsRouter(ctx));
  app.use('/api/papers', papersRouter(ctx));
  app.use('/api/negatives', negativesRouter(ctx));
  app.use('/api/locations', locationsRouter(ctx));
  app.use('/api/solution-batches', solutionBatchesRouter(ctx));
  app.use('/api/audit', auditRouter());
  app.use('/api/tone-checks', toneChecksRouter(ctx));
  app.use('/api/tone-watch', toneWatchRouter());
  app.use('/api/tone-rounds', toneRoundsRouter());
  app.use('/api/alerts', alertsRouter(ctx));
  app.use('/api/cohorts', cohortsRouter(ctx));
  app.use('/api/settings', settingsRouter(ctx));
  app.use('/api', apiNotFound);

  serveClient(app, options.clientDir ?? resolve('dist'));
  app.use(errorHandler);

  return { app, close: () => store.stopExpiringSessions() };
}

/** The built client, with every non-API path answered by its index page. */
function serveClient(app: Express, clientDir: string): void {
  const index = join(clientDir, 'index.html');
  if (!existsSync(index)) return;
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  app.get('/{*splat}', (_req, res) => res.sendFile(index));
}
