/**
 * createApp(): the Express application, never listening by itself, so tests can run
 * it in-process with supertest and index.ts can serve it.
 */
import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import helmet from 'helmet';
import { config } from './config';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import { healthRouter } from './modules/health/health.router';
import { modelRouter } from './modules/library/model.router';
import { searchRouter } from './modules/search/search.router';
import { specRouter } from './modules/specs/spec.router';
import { verdictRouter } from './modules/verdicts/verdict.router';

export function createApp(options: { webDist?: string | null } = {}) {
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  app.use(helmet({
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
  }));
  app.use(express.json({ limit: '100kb' }));

  const api = express.Router();
  api.use('/health', healthRouter);
  api.use('/search', searchRouter);
  api.use('/models', modelRouter);
  api.use('/specs', specRouter);
  api.use('/verdicts', verdictRouter);
  api.use(notFoundHandler);
  app.use('/api', api);

  const webDist = options.webDist === undefined ? config.webDist : options.webDist;
  if (webDist && fs.existsSync(path.join(webDist, 'index.html'))) serveWeb(app, webDist);

  app.use(notFoundHandler);
  app.use(errorHandler);
  return app;
}

/** The exported single-page web app; every unknown path gets index.html (client-side routes). */
function serveWeb(app: express.Express, webDist: string) {
  app.use(express.static(webDist, { index: false, maxAge: '1h', setHeaders: noCacheHtml }));
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(path.join(webDist, 'index.html'));
  });
}

function noCacheHtml(res: express.Response, filePath: string) {
  if (filePath.endsWith('.html')) res.setHeader('Cache-Control', 'no-cache');
}
