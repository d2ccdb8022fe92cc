/**
 * createApp(): the Express application, never listening by itself, so tests can run
 * it in-process with supertest and index.ts can serve it.
 */
import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import helmet from 'helmet';
import cookieParser from 'cookie-parser';
import { enforceRouteRules } from './auth/access';
import { passport } from './auth/passport';
import { config } from './config';
import { requestLogger } from './http/logging';
import { measureRequests, metricsEndpoint } from './http/metrics';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { methodNotAllowed } from './middleware/method-not-allowed';
import { noStoreForPrivate } from './middleware/no-store';
import { healthRouter } from './modules/health/health.router';
import { modelRouter } from './modules/library/model.router';
import { searchRouter } from './modules/search/search.router';
import type { SearchEngine } from './modules/search/search-engine';
import { specRouter } from './modules/specs/spec.router';
import { importRouter } from './modules/imports/import.router';
import { exportRouter } from './modules/exports/export.router';
import { verdictRouter } from './modules/verdicts/verdict.router';
import { authRouter } from './modules/accounts/account.router';
import { userRouter } from './modules/users/user.router';
import { jobRouter } from './modules/jobs/job.router';
import { correctionRouter } from './modules/corrections/correction.router';
import { devMailboxRouter } from './modules/mail/dev-mailbox.router';
import { planRouter } from './modules/plans/plan.router';
import { runRouter } from './modules/plans/run.router';
import { connectorRouter } from './modules/plans/connector.router';
import { serveWeb } from './http/static';

/** Every API router and where it is mounted under /api (the access test walks this list). */
export function apiRouters(options: AppOptions = {}): [string, express.Router][] {
  return [
    ['/health', healthRouter],
    ['/auth', authRouter()],
    ['/users', userRouter],
    ['/search', searchRouter(options.searchEngine)],
    ['/models', modelRouter],
    ['/specs', specRouter],
    ['/imports', importRouter],
    ['/exports', exportRouter],
    ['/verdicts', verdictRouter],
    ['/jobs', jobRouter],
    ['/corrections', correctionRouter()],
    ['/plans', planRouter],
    ['/jobs', runRouter],
    ['/components', connectorRouter],
  ];
}

/** `searchEngine`: a search index of its own, so one test can run two "server processes" side by side. */
export type AppOptions = { webDist?: string | null; searchEngine?: SearchEngine };

export function createApp(options: AppOptions = {}) {
  const app = express();
  app.use(requestLogger, measureRequests);
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
        },
      },
    }),
  );
  app.set('trust proxy', 'loopback');
  app.use(express.json({ limit: '100kb' }));
  app.use(cookieParser());
  app.use(passport.initialize());

  const api = express.Router();
  api.use(noStoreForPrivate);
  api.use(methodNotAllowed(api));
  api.use(enforceRouteRules);
  for (const [prefix, router] of apiRouters(options)) api.use(prefix, router);
  api.use(notFoundHandler);
  app.use('/api', api);
  app.get('/metrics', metricsEndpoint);
  if (config.NODE_ENV !== 'production') app.use('/dev', devMailboxRouter);

  const webDist = options.webDist === undefined ? config.webDist : options.webDist;
  if (webDist && fs.existsSync(path.join(webDist, 'index.html'))) serveWeb(app, webDist);

  app.use(notFoundHandler);
  app.use(errorHandler);
  return app;
}
