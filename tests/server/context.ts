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

/** A network address of its own (198.18.0.0/15, for tests), so per-address limits of other tests never meet this one's. */
export function anAddress(): string {
  const byte = () => Math.floor(Math.random() * 256);
  return `198.${18 + Math.floor(Math.random() * 2)}.${byte()}.${byte()}`;
}

/** A browser-like client behind the trusted proxy at a network address of its own (X-Forwarded-For, `trust proxy` loopback). */
export function agentAt(ctx: TestContext, ip = anAddress()): ReturnType<typeof request.agent> {
  return agent(ctx).set('X-Forwarded-For', ip);
}

/**
 * The newest mail to an address (matching `subject` when given, and caught
 * after `after` when given), as the test stack's catcher stored it; waits for it.
 */
export async function mailTo(ctx: TestContext, address: string, subject?: RegExp, o: { after?: Date; seconds?: number } = {}): Promise<{ subject: string; text: string; receivedAt: Date }> {
  return eventually(async () => {
    const rows: Array<{ subject: string; text: string; receivedAt: Date }> = await ctx.ds.query(
      'SELECT subject, text, received_at AS "receivedAt" FROM captured_mail WHERE $1 = ANY(mail_to) AND received_at > $2 ORDER BY received_at DESC',
      [address.toLowerCase(), o.after ?? new Date(0)]);
    return rows.find((r) => !subject || subject.test(r.subject));
  }, o.seconds ?? 15);
}

/** The database's clock now: a mark for `mailTo(…, { after })`. */
export async function databaseNow(ctx: TestContext): Promise<Date> {
  const [row] = await ctx.ds.query('SELECT now() AS now');
  return (row as { now: Date }).now;
}

/** The token of the first link to `path` (e.g. `/join`) in a mail's text. */
export function tokenIn(text: string, path: string): string {
  const found = new RegExp(`${path}\\?token=([A-Za-z0-9_-]+)`).exec(text);
  if (!found?.[1]) throw new Error(`no ${path} link in: ${text}`);
  return found[1];
}

export const fresh = (stem: string): string => `${stem}.${Date.now()}.${Math.round(Math.random() * 1e9)}@example.test`;

export type NewTeam = { api: ReturnType<typeof request.agent>; email: string; password: string; userId: string; teamId: string; cookie: string };

/**
 * A new team through the two sign-up steps, as a person makes one: the
 * request, the mailed link (sent by the stack's worker), the password.
 */
export async function newTeam(ctx: TestContext, o: { email?: string; displayName?: string; teamName?: string; password?: string; ip?: string } = {}): Promise<NewTeam> {
  const email = o.email ?? fresh('founder');
  const password = o.password ?? 'a long enough passphrase';
  const api = agentAt(ctx, o.ip);
  const asked = await api.post('/api/auth/sign-up').send({ email, displayName: o.displayName ?? 'Founder', teamName: o.teamName ?? `Lab ${Date.now()}` });
  if (asked.status !== 202) throw new Error(`sign-up request answered ${asked.status}: ${JSON.stringify(asked.body)}`);
  const token = tokenIn((await mailTo(ctx, email, /Finish creating/)).text, '/confirm-sign-up');
  const made = await api.post('/api/auth/sign-up/confirm').send({ token, password });
  if (made.status !== 201) throw new Error(`sign-up confirmation answered ${made.status}: ${JSON.stringify(made.body)}`);
  const cookie = String(made.headers['set-cookie']).split(';')[0]!;
  return { api, email, password, userId: made.body.user.id as string, teamId: made.body.team.id as string, cookie };
}

/**
 * Waits until the stack's worker has done the account-mail job whose data
 * matches (e.g. `{ kind: 'reset', email }`) and answers its outcome, so a
 * test can tell "nothing was sent" from "not sent yet".
 */
export async function accountMailDone(ctx: TestContext, match: Record<string, string>, seconds = 15): Promise<string> {
  return eventually(async () => {
    const rows: Array<{ state: string; output: { outcome?: string } | null }> = await ctx.ds.query(
      `SELECT state, output FROM pgboss.job WHERE name = 'account-mail' AND data @> $1::jsonb ORDER BY created_on DESC LIMIT 1`, [JSON.stringify(match)]);
    const job = rows[0];
    return job?.state === 'completed' ? String(job.output?.outcome ?? '') : undefined;
  }, seconds);
}
