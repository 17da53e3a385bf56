import type PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';
import { WorkerHeartbeat } from '../db/entities';
import type { Mailer } from '../mail/mailer';
import type { RelayStatus } from '../realtime/event-relay';

export type Check = { ok: boolean; detail: string };
export type Health = { status: 'ok' | 'degraded'; version: string; checks: Record<'database' | 'queue' | 'worker' | 'mail', Check> & { events?: Check } };

async function guard(fn: () => Promise<Check>): Promise<Check> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    const late = new Promise<Check>((resolve) => { timer = setTimeout(() => resolve({ ok: false, detail: `no answer within ${checkTimeoutMs / 1000} s` }), checkTimeoutMs); });
    return await Promise.race([fn(), late]);
  } catch (err) {
    return { ok: false, detail: err instanceof Error ? err.message : String(err) };
  } finally {
    clearTimeout(timer);
  }
}

export type HealthDeps = { ds: DataSource; boss: PgBoss; mailer: Mailer; heartbeatSeconds: number; version: string; eventRelay?: () => RelayStatus };

/** An answer within this long, or the check reports itself as failed (a half-dead database must not hang health). */
const checkTimeoutMs = 4000;

/** Each dependency checked independently, so one failure never hides another. */
export async function checkHealth(d: HealthDeps): Promise<Health> {
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
    guard(async () => ({ ok: await d.mailer.verify(), detail: 'SMTP server answered' })),
  ]);
  const relay = d.eventRelay?.();
  const checks = { database, queue, worker, mail, ...(relay ? { events: { ok: relay.listening, detail: relay.detail } } : {}) };
  const status = Object.values(checks).every((c) => c.ok) ? 'ok' : 'degraded';
  return { status, version: d.version, checks };
}
