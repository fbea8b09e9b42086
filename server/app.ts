/** createApp(): the Express app, without listening (main.ts listens; tests run it in-process). */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppContext } from './app-context';
import { apiRouter } from './api-router';
import { errorHandler } from './http/error-handler';
import { csrfProtection } from './http/csrf';
import { sessionMiddleware } from './session/session-middleware';
import { trustProxySetting } from './session/trust-proxy-setting';

/** Builds the app: security headers, logging, JSON API under /api, then the built Angular app. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  if (ctx.config.trustProxy) app.set('trust proxy', trustProxySetting(ctx.config.trustProxy));
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          workerSrc: ["'self'", 'blob:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({ logger: ctx.logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }),
  );
  app.use(
    '/api',
    express.json({ limit: '1mb' }),
    ...sessionMiddleware(ctx),
    csrfProtection(ctx.auth.sessionSecret),
    apiRouter(ctx),
  );
  const staticDir = ctx.config.staticDir;
  if (existsSync(join(staticDir, 'index.html'))) {
    app.use(express.static(staticDir, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(join(staticDir, 'index.html')));
  }
  app.use(errorHandler);
  return app;
}
