import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { WorkerHeartbeat } from '../db/entities';
import type { Mailer } from '../mail/mailer';
import type { HealthDetails, PublicHealth } from '../../shared/api/health';
import type { RelayStatus } from '../realtime/event-relay';
import { cachedCheck, type Freshness } from './cached-check';
import { withoutSecrets } from './without-secrets';

export type Check = { ok: boolean; detail: string };
export type Health = HealthDetails;

async function guard(fn: () => Promise<Check>): Promise<Check> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    const late = new Promise<Check>((resolve) => { timer = setTimeout(() => resolve({ ok: false, detail: `no answer within ${checkTimeoutMs / 1000} s` }), checkTimeoutMs); });
    return await Promise.race([fn(), late]);
  } catch (err) {
    return { ok: false, detail: withoutSecrets(err instanceof Error ? err.message : String(err)) };
  } finally {
    clearTimeout(timer);
  }
}

/** `mailFreshness`: how long an SMTP check stands (tests shorten it). */
export type HealthDeps = { ds: DataSource; boss: PgBoss; mailer: Mailer; heartbeatSeconds: number; version: string; eventRelay?: () => RelayStatus; mailFreshness?: Freshness };

/** An answer within this long, or the check reports itself as failed (a half-dead database must not hang health). */
const checkTimeoutMs = 4000;

/**
 * The SMTP check opens a session with the mail server: once a minute is
 * plenty, and an anonymous caller polling health must not make the API
 * open one per request. A failure is looked at again after 15 s.
 */
const mailFreshness: Freshness = { okMs: 60_000, failedMs: 15_000 };

/** One per API process: health checks with the SMTP result kept between requests. */
export function healthChecker(d: HealthDeps): () => Promise<Health> {
  const mail = cachedCheck(() => guard(async () => ({ ok: await d.mailer.verify(), detail: 'SMTP server answered' })), d.mailFreshness ?? mailFreshness);
  return () => checkHealth(d, mail);
}

/** Each dependency checked independently, so one failure never hides another. */
export async function checkHealth(d: HealthDeps, mailCheck: () => Promise<Check>): Promise<Health> {
  const [database, queue, worker, mail] = await Promise.all([
    guard(async () => {
      const t0 = Date.now();
      await d.ds.query('SELECT 1');
      return { ok: true, detail: `PostgreSQL answered in ${Date.now() - t0} ms` };
    }),
    guard(async () => {
      const names = (await d.boss.getQueues()).map((q) => q.name);
      return { ok: names.length > 0, detail: `pg-boss up, queues: ${names.join(', ') || 'none'}` };
    }),
    guard(async () => {
      const newest = await d.ds.getRepository(WorkerHeartbeat).find({ order: { lastSeen: 'DESC' }, take: 1 });
      const last = newest[0];
      if (!last) return { ok: false, detail: 'no worker has ever reported' };
      const age = (Date.now() - last.lastSeen.getTime()) / 1000;
      const ok = age <= 3 * d.heartbeatSeconds;
      return { ok, detail: `newest heartbeat ${age.toFixed(1)} s ago from ${last.hostname} pid ${last.pid}` };
    }),
    mailCheck(),
  ]);
  const relay = d.eventRelay?.();
  const checks = { database, queue, worker, mail, ...(relay ? { events: { ok: relay.listening, detail: withoutSecrets(relay.detail) } } : {}) };
  const status = Object.values(checks).every((c) => c.ok) ? 'ok' : 'degraded';
  return { status, version: d.version, checks };
}

/** Who asks: the operator sees every check whole, admins every check without host names and process ids, members the version too, anyone else only ok or degraded. */
export type HealthAudience = 'operator' | 'details' | 'member' | 'anyone';

/** " from <host> pid <n>": which machine runs a worker is the operator's business only. */
const whereFrom = / from \S+ pid \d+$/;

export function healthFor(h: Health, audience: HealthAudience): HealthDetails | PublicHealth {
  if (audience === 'operator') return h;
  if (audience === 'details') return { ...h, checks: { ...h.checks, worker: { ...h.checks.worker, detail: h.checks.worker.detail.replace(whereFrom, '') } } };
  return audience === 'member' ? { status: h.status, version: h.version } : { status: h.status };
}
