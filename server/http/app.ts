import express, { type Express, type RequestHandler } from 'express';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import type { Auth } from '../auth/lucia';
import type { Env } from '../config/env';
import type { Mailer } from '../mail/mailer';
import type { RelayStatus } from '../realtime/event-relay';
import { auditRoutes } from '../routes/audit-routes';
import { authRoutes } from '../routes/auth-routes';
import { designRoutes } from '../routes/design-routes';
import { familyRoutes } from '../routes/family-routes';
import { growthRoutes } from '../routes/growth-routes';
import { moduleRoutes } from '../routes/module-routes';
import { systemRoutes } from '../routes/system-routes';
import { teamRoutes } from '../routes/team-routes';
import { sessionReader } from './access';
import { errorHandler, notFoundApi } from './errors';
import { originCheck } from './origin-check';
import { mountRoutes, type RouteSpec } from './route-table';

/** `eventRelay`: the API process's socket relay, reported by health (absent where no sockets are attached, as in tests). */
export type AppDeps = { env: Env; ds: DataSource; boss: PgBoss; mailer: Mailer; auth: Auth; version: string; eventRelay?: () => RelayStatus };

/** Every API route, in one table: what the access matrix test walks. */
export function apiRoutes(d: AppDeps): RouteSpec[] {
  const accountDeps = { ds: d.ds, auth: d.auth, boss: d.boss, appOrigin: d.env.appOrigin };
  return [
    ...systemRoutes({ ds: d.ds, boss: d.boss, mailer: d.mailer, heartbeatSeconds: d.env.heartbeatSeconds, version: d.version, mailCatcher: d.env.mailCatcher, eventRelay: d.eventRelay }),
    ...authRoutes(accountDeps),
    ...teamRoutes(accountDeps),
    ...auditRoutes(d.ds),
    ...familyRoutes(d.ds),
    ...designRoutes({ ds: d.ds, boss: d.boss, runQueue: d.env.runQueue, fair: d.env.fairShare, heartbeatSeconds: d.env.heartbeatSeconds }),
    ...growthRoutes({ ds: d.ds, boss: d.boss, mailer: d.mailer, appOrigin: d.env.appOrigin }),
    ...moduleRoutes(d.ds),
  ];
}

/** `npm run dev` serves the client from Expo's dev server on another loopback port. */
const devCors: RequestHandler = (req, res, next) => {
  const origin = req.get('origin');
  if (origin && /^http:\/\/(127\.0\.0\.1|localhost):\d+$/.test(origin)) {
    res.set({ 'Access-Control-Allow-Origin': origin, Vary: 'Origin', 'Access-Control-Allow-Credentials': 'true' });
    if (req.method === 'OPTIONS') {
      res.set({ 'Access-Control-Allow-Methods': 'GET,POST,PUT,DELETE', 'Access-Control-Allow-Headers': 'Content-Type' }).status(204).end();
      return;
    }
  }
  next();
};

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp(d: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  if (!d.env.production) app.use('/api', devCors);
  app.use('/api', express.json({ limit: '2mb' }));
  app.use('/api', originCheck(d.env.appOrigin, !d.env.production));
  app.use('/api', sessionReader(d.auth));
  app.use('/api', mountRoutes(d.ds, apiRoutes(d)));
  app.use('/api', notFoundApi);
  serveWeb(app, resolve(d.env.webDist));
  app.use(errorHandler(!d.env.production && d.env.profile !== 'test'));
  return app;
}

/** The exported web build at the same origin as the API, so cookies just work. */
function serveWeb(app: Express, dist: string): void {
  const index = join(dist, 'index.html');
  app.use(express.static(dist, { index: false, maxAge: '1h' }));
  app.get('/{*path}', (_req, res) => {
    if (existsSync(index)) res.sendFile(index);
    else res.status(503).type('text').send('The web build is missing: run `npm start` (it exports the app) or `npx expo export --platform web`.');
  });
}
