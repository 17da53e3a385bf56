import 'reflect-metadata';
import type { Express } from 'express';
import type { Pool } from 'pg';
import request from 'supertest';
import { createAuth } from '../../server/auth/auth-pool';
import type { Auth } from '../../server/auth/lucia';
import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { readEnv, type Env } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { createApp } from '../../server/http/app';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { startBoss } from '../../server/queue/boss';

export type TestContext = { env: Env; ds: DataSource; boss: PgBoss; mailer: Mailer; auth: Auth; pool: Pool; app: Express; close: () => Promise<void> };

/**
 * The app wired to the real test database, queue and mail catcher that
 * `npm test` has started (tests/run-all.ts). No port is opened: supertest
 * drives the Express app directly.
 */
export async function openContext(overrides: Partial<Env> = {}): Promise<TestContext> {
  const env = { ...readEnv({ ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test' }), ...overrides };
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-jest').initialize();
  const boss = await startBoss(env.databaseUrl, 'frostgrade-jest', [env.runQueue]);
  const mailer = createMailer(env);
  const { auth, pool } = createAuth(env);
  const app = createApp({ env, ds, boss, mailer, auth, version: 'test' });
  return {
    env, ds, boss, mailer, auth, pool, app,
    close: async () => {
      mailer.close();
      await pool.end();
      await boss.stop({ graceful: false, wait: true });
      await ds.destroy();
    },
  };
}

export async function eventually<T>(probe: () => Promise<T | undefined>, seconds = 10): Promise<T> {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    const v = await probe();
    if (v !== undefined) return v;
    if (Date.now() > deadline) throw new Error(`condition not met within ${seconds} s`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** A browser-like client: sends the app's Origin and keeps the session cookie. */
export function agent(ctx: TestContext): ReturnType<typeof request.agent> {
  return request.agent(ctx.app).set('Origin', ctx.env.appOrigin);
}

/** A client signed in as the given account, without the sign-in route (which is rate-limited). */
export async function signedIn(ctx: TestContext, email: string): Promise<ReturnType<typeof request.agent>> {
  const [row] = await ctx.ds.query('SELECT id FROM app_user WHERE lower(email) = lower($1) AND removed_at IS NULL', [email]);
  if (!row) throw new Error(`no account ${email}`);
  const session = await ctx.auth.createSession((row as { id: string }).id, {});
  return agent(ctx).set('Cookie', ctx.auth.createSessionCookie(session.id).serialize());
}

export const demo = {
  admin: 'ada@northlight.example',
  physicist: 'piet@northlight.example',
  grower: 'greta@northlight.example',
  viewer: 'vic@northlight.example',
  otherTeamAdmin: 'hana@harbour.example',
} as const;
