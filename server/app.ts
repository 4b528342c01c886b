import { existsSync } from 'node:fs';
import { join } from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';
import { alertRoutes } from './alerts/alerts.routes';
import { authenticate } from './auth/authenticate';
import { authRoutes } from './auth/auth.routes';
import { batchRoutes } from './batches/batches.routes';
import type { AppConfig } from './config';
import { exposureRoutes } from './exposure/exposure.routes';
import { ApiError, errorHandler } from './http/errors';
import { originGuard } from './http/originGuard';
import { mountRoutes, type RouteInfo } from './http/route';
import { importRoutes } from './imports/imports.routes';
import { loggerRoutes } from './loggers/loggers.routes';
import type { Mailer } from './mail/mailer';
import { nurseryRoutes } from './nurseries/nurseries.routes';
import { overviewRoutes } from './overview/overview.routes';
import { profileRoutes } from './profiles/profiles.routes';
import { roomRoutes } from './rooms/rooms.routes';
import { seasonRoutes } from './season/season.routes';
import { seriesRoutes } from './series/series.routes';
import { systemRoutes } from './system/system.routes';
import { tokenRoutes } from './tokens/tokens.routes';
import { userRoutes } from './users/users.routes';

export interface AppDeps {
  config: AppConfig;
  sequelize: Sequelize;
  /** The connector pool for readings (bulk insert and streaming). */
  pool: Pool;
  mailer: Mailer;
  /** The built client; served with a fallback to index.html for client-side routes. */
  clientDir?: string;
}

export function createApp(deps: AppDeps): { app: Express; routes: RouteInfo[] } {
  const { config, sequelize, mailer } = deps;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: { directives: { 'img-src': ["'self'", 'data:'], 'upgrade-insecure-requests': null } },
      strictTransportSecurity: config.secureCookies,
    }),
  );
  app.use(express.json({ limit: '2mb' }));
  app.use(cookieParser());

  const { router, table } = mountRoutes([
    ...systemRoutes(config, sequelize),
    ...authRoutes(config, sequelize),
    ...userRoutes(config, sequelize, mailer),
    ...nurseryRoutes(),
    ...tokenRoutes(),
    ...roomRoutes(),
    ...loggerRoutes(sequelize),
    ...importRoutes(deps.pool),
    ...profileRoutes(),
    ...batchRoutes(sequelize),
    ...exposureRoutes(deps.pool),
    ...alertRoutes(sequelize),
    ...seriesRoutes(deps.pool),
    ...overviewRoutes(deps.pool),
    ...seasonRoutes(sequelize, deps.pool),
  ]);
  app.use('/api', originGuard(config.appOrigin), authenticate(config.jwtSecret), router);
  app.use('/api', (_req, _res, next) => next(new ApiError(404, 'no_such_route', 'There is no such API route.')));

  const clientDir = deps.clientDir;
  if (clientDir && existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get('/{*path}', (_req, res) => res.sendFile(join(clientDir, 'index.html')));
  }
  app.use(errorHandler);
  return { app, routes: table };
}
