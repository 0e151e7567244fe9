import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import compression from 'compression';
import cookieParser from 'cookie-parser';
import { ConnectSessionKnexStore } from 'connect-session-knex';
import { doubleCsrf } from 'csrf-csrf';
import express from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { Knex } from 'knex';
import type { Config } from './config';
import type { AppContext } from './context';
import { createBackground } from './lib/background';
import { createAdviceJobs } from './modules/advice/advice-jobs';
import { createPhotoStore, type PhotoStore } from './modules/photos/photo-store';
import { createForecast } from './modules/weather/forecast/create-forecast';
import type { ForecastProvider } from './modules/weather/forecast/forecast-provider';
import { anonymousCsrfId } from './lib/anonymous-id';
import { consoleLogger, type Logger } from './lib/logger';
import { touchRarely } from './lib/touch-rarely';
import { createMailer, type Mailer } from './mail/mailer';
import { errorHandler, notFoundHandler } from './middleware/errors';
import { devRoutes } from './modules/dev/dev.routes';
import { apiRoutes } from './routes';
import { authRoutes } from './modules/auth/auth.routes';
import { invitationLinkRoutes } from './modules/invitations/invitations.routes';
import { createPassport } from './modules/auth/passport';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export interface AppOptions {
  config: Config;
  db: Knex;
  mailer?: Mailer;
  /** Folder of the built client; served with an SPA fallback when it exists. */
  clientDir?: string | null;
  log?: Logger;
  /** Where photos are kept; by default what PHOTO_STORAGE names. */
  photos?: PhotoStore;
  /** Where the season log's forecast comes from; by default what FORECAST_URL names. */
  forecast?: ForecastProvider;
}

/** Build the Express app. Exported for tests; `index.ts` only listens. */
export function createApp(opts: AppOptions) {
  const { config, db } = opts;
  const log = opts.log ?? consoleLogger;
  const ctx: AppContext = {
    db,
    config,
    log,
    mailer: opts.mailer ?? createMailer(config, db, log),
    background: createBackground(log),
    advice: createAdviceJobs({ db, database: config.database, log }),
    photos: opts.photos ?? createPhotoStore(config.photos),
    forecast: opts.forecast ?? createForecast(config),
  };
  const production = config.NODE_ENV === 'production';
  const app = express();
  // `X-Forwarded-For` counts only from a proxy the operator named; by default nobody's.
  app.set('trust proxy', config.TRUST_PROXY);
  app.disable('x-powered-by');

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          'default-src': ["'self'"],
          'base-uri': ["'self'"],
          'connect-src': ["'self'"],
          // Vite inlines the smallest font subsets as data: URLs.
          'font-src': ["'self'", 'data:'],
          'form-action': ["'self'"],
          'frame-ancestors': ["'none'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'object-src': ["'none'"],
          'script-src': ["'self'"],
          'script-src-attr': ["'none'"],
          // Leaflet and the charts position elements with inline style attributes.
          'style-src': ["'self'", "'unsafe-inline'"],
          // The service worker (sw.js) and the map's workers; the app's manifest.
          'worker-src': ["'self'", 'blob:'],
          'manifest-src': ["'self'"],
          ...(config.COOKIE_SECURE ? { 'upgrade-insecure-requests': [] } : {}),
        },
      },
      // HSTS only where the app is served over HTTPS (COOKIE_SECURE=true behind TLS).
      strictTransportSecurity: config.COOKIE_SECURE
        ? { maxAge: 180 * 24 * 3600, includeSubDomains: false }
        : false,
    }),
  );
  // Large answers shrink several-fold; tiles are already compressed, and an answer that set
  // `res.locals.encoded` (the map's, gzipped in a worker or sent as it was asked) is left alone.
  app.use(
    compression({
      // Fast over small: JSON shrinks almost as well at level 1, at a third of the work.
      level: 1,
      filter: (req, res) =>
        !req.path.startsWith('/api/basemaps/') &&
        !res.locals.encoded &&
        compression.filter(req, res),
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());

  const store = touchRarely(
    new ConnectSessionKnexStore({
      knex: db,
      tableName: 'sessions',
      createTable: false,
      cleanupInterval: config.NODE_ENV === 'test' ? 0 : 15 * 60_000,
    }),
    10 * 60_000,
  );
  app.use(
    session({
      name: 'clearwood.sid',
      secret: config.SESSION_SECRET,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.COOKIE_SECURE,
        maxAge: 14 * 24 * 3600_000,
      },
    }),
  );
  const passport = createPassport(db);
  app.use(passport.session());

  const { generateCsrfToken, doubleCsrfProtection } = doubleCsrf({
    getSecret: () => config.SESSION_SECRET,
    // Signed in: the stored session. Before that: a cookie-only id, so that an anonymous visitor
    // asking for a token leaves no session row behind.
    getSessionIdentifier: (req) =>
      req.user ? `session:${req.session.id}` : `anonymous:${anonymousCsrfId(req)}`,
    cookieName: config.COOKIE_SECURE ? '__Host-clearwood.x-csrf' : 'clearwood.x-csrf',
    cookieOptions: { sameSite: 'lax', secure: config.COOKIE_SECURE, path: '/' },
    errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'invalid csrf token' },
  });

  app.use('/api', doubleCsrfProtection);
  app.use('/api', devRoutes(ctx));
  app.use('/api/auth', authRoutes(ctx, passport, generateCsrfToken));
  app.use('/api', invitationLinkRoutes(ctx));
  app.use('/api', apiRoutes(ctx));
  app.use('/api', notFoundHandler);

  // Shipped demo tiles, straight from public/ so an older client build never shadows them.
  app.use(
    '/tiles',
    express.static(path.join(root, 'public', 'tiles'), {
      maxAge: production ? '1d' : 0,
      fallthrough: false,
    }),
  );

  const clientDir = opts.clientDir === undefined ? path.join(root, 'dist') : opts.clientDir;
  if (clientDir && fs.existsSync(path.join(clientDir, 'index.html'))) {
    app.use(
      express.static(clientDir, {
        index: false,
        maxAge: production ? '1h' : 0,
        // The service worker, its manifest and the shell are asked for afresh, so a new build is
        // found on the next visit; the hashed assets they name may be cached.
        setHeaders: (res, file) => {
          if (/(^|[\\/])(sw\.js|manifest\.webmanifest|index\.html)$/.test(file))
            res.setHeader('Cache-Control', 'no-cache');
        },
      }),
    );
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorHandler({ log }));
  return Object.assign(app, { ctx });
}
