import express from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { randomUUID } from 'node:crypto';
import type { AppContext } from './context';
import { verifyOrigin } from './http/csrf';
import { loadUser } from './http/current-user';
import { errorHandler, notFoundApi } from './http/error-handler';
import { sessionMiddleware } from './http/session';
import { authRoutes } from './routes/auth';
import { healthRoutes } from './routes/health';
import { workspaceRoutes } from './routes/workspaces';
import { libraryRoutes } from './routes/library';
import { projectionRoutes } from './routes/projections';
import { sweepRoutes } from './routes/sweeps';
import { tokenRoutes } from './routes/tokens';
import { shareRoutes } from './routes/shares';
import { referenceRoutes } from './routes/reference';
import { bearerAuth } from './http/bearer';
import { lessonRoutes } from './routes/lessons';
import { speciesCardRoutes } from './routes/species-cards';
import { invitationRoutes } from './routes/invitations';
import { passwordResetRoutes } from './routes/password-reset';
import { notificationRoutes } from './routes/notifications';
import { devRoutes } from './routes/dev';
import { usesFakeSmtp } from './mail/start';
import { recordRoutes } from './routes/records';

const redactLinkTokens = (url: string) =>
  url.replace(/\/(invitations|password-reset|class)\/[^/?#]+/g, '/$1/[redacted]');

const clientDist = fileURLToPath(new URL('../dist/client', import.meta.url));

/** Builds the Express app; main.ts listens, tests hand it to supertest. */
export function createApp(ctx: AppContext) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', ctx.config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'style-src': ["'self'", "'unsafe-inline'"],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          'font-src': ["'self'"],
          'object-src': ["'none'"],
          'frame-ancestors': ["'none'"],
          'upgrade-insecure-requests': ctx.config.cookieSecure ? [] : null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger: ctx.logger,
      genReqId: (req, res) => {
        const id = (req.headers['x-request-id'] as string | undefined)?.slice(0, 64) ?? randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      customLogLevel: (_req, res, err) =>
        err || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
      serializers: {
        // Link secrets (invitations, password resets, class links) never reach the logs.
        req: (req) => ({ id: req.id, method: req.method, url: redactLinkTokens(req.url) }),
        res: (res) => ({ statusCode: res.statusCode }),
      },
    }),
  );

  const { middleware: session } = sessionMiddleware(ctx.config, ctx.pool, ctx.sessionSecret);
  const api = express.Router();
  api.use(express.json({ limit: '1mb', strict: true }));
  api.use(session);
  api.use(verifyOrigin(ctx.config.publicOrigin));
  api.use(bearerAuth(ctx.db));
  api.use(loadUser(ctx.db));
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use(healthRoutes(ctx));
  api.use(referenceRoutes());
  api.use(authRoutes(ctx));
  api.use(workspaceRoutes(ctx));
  api.use(libraryRoutes(ctx));
  api.use(projectionRoutes(ctx));
  api.use(sweepRoutes(ctx));
  api.use(tokenRoutes(ctx));
  api.use(shareRoutes(ctx));
  api.use(lessonRoutes(ctx));
  api.use(speciesCardRoutes(ctx));
  api.use(invitationRoutes(ctx));
  api.use(passwordResetRoutes(ctx));
  api.use(notificationRoutes(ctx));
  api.use(recordRoutes(ctx));
  if (usesFakeSmtp(ctx.config)) api.use(devRoutes(ctx));
  api.use(notFoundApi);
  app.use('/api', api);

  if (existsSync(clientDist)) {
    app.use(express.static(clientDist, { index: false, maxAge: '1h' }));
    // The client routes in the browser: every other GET gets the app's page.
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile('index.html', { root: clientDist, maxAge: 0 }));
  }
  app.use(errorHandler(ctx.logger));
  return app;
}
