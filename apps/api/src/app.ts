// Builds Heatpath's Express app (no listen): API routes under /api, and the built web app with
// a fallback to index.html for client routes. Tests import this.
import { existsSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import cookieParser from 'cookie-parser';
import express from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import { systemClock } from './lib/clock';
import type { Clock } from './lib/clock';
import { createDeviceSigner } from './lib/device-token';
import { serializeError } from './lib/logger';
import { createSessionSigner } from './lib/session-token';
import { authenticate } from './middlewares/authenticate';
import { crossSiteGuard } from './middlewares/cross-site-guard';
import { apiNotFound, errorHandler } from './middlewares/error-handler';
import { authRouter } from './routes/auth/auth.router';
import { healthRouter } from './routes/health/health.router';
import { meRouter } from './routes/me/me.router';
import { staffRouter } from './routes/staff/staff.router';
import { customersRouter } from './routes/customers/customers.router';
import { vehiclesRouter } from './routes/vehicles/vehicles.router';
import { casesRouter } from './routes/cases/cases.router';
import { treesRouter } from './routes/trees/trees.router';
import { outboxRouter } from './routes/outbox/outbox.router';
import { trainingRouter } from './routes/training/training.router';
import { createDiskFileStore } from './lib/storage/disk-file-store';
import { createMailContext } from './lib/mail/mail-context';
import type { MailContext } from './lib/mail/mail-context';
import type { FileStore } from './lib/storage/file-store';

export interface AppDeps {
  config: Config;
  sequelize: Sequelize;
  logger: Logger;
  store?: FileStore;
  mail?: MailContext;
  /** "Now" for sessions and sign-in limits; tests move it on instead of sleeping. */
  clock?: Clock;
}

export function createApp(deps: AppDeps): express.Express {
  const { config, sequelize, logger } = deps;
  const store = deps.store ?? createDiskFileStore(config.uploadDir);
  const clock = deps.clock ?? systemClock;
  const signer = createSessionSigner(config.sessionSecret, config.sessionTtlHours, clock);
  const devices = createDeviceSigner(config.sessionSecret, config.signInDeviceDays, clock);
  const mail =
    deps.mail ??
    createMailContext({ publicUrl: config.mail.publicUrl, secret: config.sessionSecret });
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);
  app.set('query parser', 'simple');

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.cookieSecure ? [] : null,
        },
      },
      // Secure cookies mean Heatpath is served over HTTPS: browsers should never try plain http.
      strictTransportSecurity: config.cookieSecure,
    }),
  );

  const api = express.Router();
  api.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/health' },
      // The same error serializer as the logger's, so no SQL or bound value reaches a log line.
      serializers: { err: serializeError },
    }),
  );
  api.use(express.json({ limit: config.bodyLimit, strict: true }));
  api.use(cookieParser());
  api.use(crossSiteGuard);
  // Nothing the API sends is cached: attachments, repair-order exports and logs hold customers'
  // details, and a shared workshop PC must not keep them after sign-out.
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use('/health', healthRouter({ sequelize }));
  api.use('/auth', authRouter({ config, sequelize, signer, devices, clock, mail }));
  api.use(authenticate(signer, clock));
  api.use('/me', meRouter());
  api.use('/staff', staffRouter({ config, mail }));
  api.use('/vehicles', vehiclesRouter());
  api.use('/customers', customersRouter());
  api.use('/trees', treesRouter());
  api.use('/cases', casesRouter({ store, mail }));
  api.use('/outbox', outboxRouter());
  api.use('/training', trainingRouter({ store }));
  api.use(apiNotFound);
  api.use(errorHandler);
  app.use('/api', api);

  const webDist = config.webDist ? resolve(config.webDist) : null;
  if (webDist && existsSync(join(webDist, 'index.html'))) {
    const alwaysRevalidated = new Set(['sw.js', 'index.html', 'manifest.webmanifest']);
    app.use(
      express.static(webDist, {
        index: false,
        maxAge: '1h',
        // The service worker and the files it reads to decide what the tablet keeps are always
        // checked with the server, so a new build reaches the tablets on their next visit; the
        // hashed chunks and workbox-*.js keep the hour.
        setHeaders: (res, path) => {
          if (alwaysRevalidated.has(basename(path))) res.set('Cache-Control', 'no-cache');
        },
      }),
    );
    app.get('/{*path}', (_req, res) => {
      res.set('Cache-Control', 'no-cache');
      res.sendFile(join(webDist, 'index.html'));
    });
  }
  app.use(errorHandler);
  return app;
}
