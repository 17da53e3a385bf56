import express, { type Express } from 'express';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import type { Env } from '../config/env';
import type { Mailer } from '../mail/mailer';
import { familyRoutes } from '../routes/family-routes';
import { systemRoutes } from '../routes/system-routes';
import { errorHandler, notFoundApi } from './errors';
import { teamContext } from './team-context';

export type AppDeps = { env: Env; ds: DataSource; boss: PgBoss; mailer: Mailer; version: string; demoTeamSlug?: string };

/** Builds the Express app without listening, so tests drive it through supertest. */
export function createApp(d: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use('/api', express.json({ limit: '1mb' }));
  // `npm run dev` serves the client from Expo's dev server on another port.
  if (!d.env.production) {
    app.use('/api', (req, res, next) => {
      const origin = req.get('origin');
      if (origin && /^http:\/\/(127\.0\.0\.1|localhost):\d+$/.test(origin)) {
        res.set('Access-Control-Allow-Origin', origin).set('Vary', 'Origin').set('Access-Control-Allow-Credentials', 'true');
      }
      next();
    });
  }
  const api = express.Router();
  api.use(systemRoutes({ ds: d.ds, boss: d.boss, mailer: d.mailer, heartbeatSeconds: d.env.heartbeatSeconds, version: d.version, mailCatcher: d.env.mailCatcher }));
  api.use(teamContext(d.ds, d.demoTeamSlug ?? 'northlight'));
  api.use(familyRoutes(d.ds));
  api.use(notFoundApi);
  app.use('/api', api);
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
