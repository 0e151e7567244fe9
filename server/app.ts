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
import { createMailer, type Mailer } from './mail/mailer';
import { errorHandler, notFoundHandler } from './middleware/errors';
import { apiRoutes } from './routes';
import { authRoutes } from './modules/auth/auth.routes';
import { createPassport } from './modules/auth/passport';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

export interface AppOptions {
  config: Config;
  db: Knex;
  mailer?: Mailer;
  /** Folder of the built client; served with an SPA fallback when it exists. */
  clientDir?: string | null;
  log?: (err: unknown) => void;
}

/** Build the Express app. Exported for tests; `index.ts` only listens. */
export function createApp(opts: AppOptions) {
  const { config, db } = opts;
  const ctx: AppContext = { db, config, mailer: opts.mailer ?? createMailer(config, db) };
  const production = config.NODE_ENV === 'production';
  const app = express();
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.COOKIE_SECURE ? [] : null,
        },
      },
      strictTransportSecurity: config.COOKIE_SECURE,
    }),
  );
  // Large answers (a whole stand's map data) shrink several-fold; tiles are already compressed.
  app.use(
    compression({
      filter: (req, res) => !req.path.startsWith('/api/basemaps/') && compression.filter(req, res),
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());

  const store = new ConnectSessionKnexStore({
    knex: db,
    tableName: 'sessions',
    createTable: false,
    cleanupInterval: config.NODE_ENV === 'test' ? 0 : 15 * 60_000,
  });
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
    getSessionIdentifier: (req) => req.session.id,
    cookieName: config.COOKIE_SECURE ? '__Host-clearwood.x-csrf' : 'clearwood.x-csrf',
    cookieOptions: { sameSite: 'lax', secure: config.COOKIE_SECURE, path: '/' },
    errorConfig: { statusCode: 403, code: 'EBADCSRFTOKEN', message: 'invalid csrf token' },
  });

  app.use('/api', doubleCsrfProtection);
  app.use('/api/auth', authRoutes(ctx, passport, generateCsrfToken));
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
    app.use(express.static(clientDir, { index: false, maxAge: production ? '1h' : 0 }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }

  app.use(errorHandler({ production, log: opts.log }));
  return app;
}
