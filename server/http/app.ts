import compression from 'compression';
import express, { type Express, type RequestHandler } from 'express';
import { join, resolve } from 'node:path';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import type { Auth } from '../auth/lucia';
import type { Env } from '../config/env';
import type { Mailer } from '../mail/mailer';
import type { RelayStatus } from '../realtime/event-relay';
import { auditRoutes } from '../routes/audit-routes';
import { coolerRoutes } from '../routes/cooler-routes';
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
import { apiHeaders, webHeaders } from './security-headers';
import { inlineScriptHashes, serveWeb } from './web-assets';

/** `eventRelay`: the API process's socket relay, reported by health (absent where no sockets are attached, as in tests). */
export type AppDeps = { env: Env; ds: DataSource; boss: PgBoss; mailer: Mailer; auth: Auth; version: string; eventRelay?: () => RelayStatus };

/** Every API route, in one table: what the access matrix test walks. */
export function apiRoutes(d: AppDeps): RouteSpec[] {
  const accountDeps = { ds: d.ds, auth: d.auth, boss: d.boss, appOrigin: d.env.appOrigin };
  const runDeps = { ds: d.ds, boss: d.boss, runQueue: d.env.runQueue, fair: d.env.fairShare, heartbeatSeconds: d.env.heartbeatSeconds };
  return [
    ...systemRoutes({ ds: d.ds, boss: d.boss, mailer: d.mailer, heartbeatSeconds: d.env.heartbeatSeconds, version: d.version, mailCatcher: d.env.mailCatcher, eventRelay: d.eventRelay }),
    ...authRoutes(accountDeps),
    ...teamRoutes(accountDeps),
    ...auditRoutes(d.ds),
    ...familyRoutes(d.ds),
    ...designRoutes(runDeps),
    ...growthRoutes({ ds: d.ds, boss: d.boss, mailer: d.mailer, appOrigin: d.env.appOrigin }),
    ...moduleRoutes(d.ds),
    ...coolerRoutes(runDeps),
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
  // Behind a reverse proxy req.ip (rate limits, the audit trail) comes from X-Forwarded-For, believed only for the hops TRUST_PROXY names.
  app.set('trust proxy', d.env.trustProxy);
  // Bundles, HTML, fonts, CanvasKit's .wasm and JSON shrink to half or less; PNGs (compressed already) go as they are.
  app.use(compression());
  app.use('/api', apiHeaders(d.env.appOrigin));
  if (!d.env.production) app.use('/api', devCors);
  app.use('/api', express.json({ limit: '2mb' }));
  app.use('/api', originCheck(d.env.appOrigin, !d.env.production));
  app.use('/api', sessionReader(d.auth));
  app.use('/api', mountRoutes(d.ds, apiRoutes(d)));
  app.use('/api', notFoundApi);
  const dist = resolve(d.env.webDist);
  app.use(webHeaders(d.env.appOrigin, inlineScriptHashes(join(dist, 'index.html'))));
  serveWeb(app, dist);
  app.use(errorHandler(d.env.profile !== 'test'));
  return app;
}
