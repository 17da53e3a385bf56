/**
 * Queue and live-progress figures for `npm run bench` (printed, never
 * asserted): enqueue-to-start latency, progress latency from a worker to a
 * watching browser socket (p50/p95), and runs per minute with 1 and 2
 * workers. It stands up its own database, API, mail catcher and workers on
 * private ports, so it can run beside `npm start`.
 */
import 'reflect-metadata';
import { io as connect, type Socket } from 'socket.io-client';
import { readEnv } from '../../server/config/env';
import { createAuth } from '../../server/auth/auth-pool';
import { createDataSource } from '../../server/db/data-source';
import { prepareDatabase } from '../../server/ops/database';
import { startServices, type Service } from '../../server/ops/supervise';
import type { RunProgress } from '../../shared/api';

const settings = { FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test', PORT: '8391', SMTP_PORT: '2591', RUN_QUEUE: 'bench-runs', DATABASE_URL: 'postgres://postgres@127.0.0.1:54339/frostgrade_bench' };
const childEnv = { ...process.env, ...settings } as NodeJS.ProcessEnv;
const env = readEnv(childEnv);

const pct = (xs: number[], p: number): number => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))] ?? NaN;
const ms = (v: number): string => `${v.toFixed(0)} ms`;

async function main(): Promise<void> {
  await prepareDatabase(env, { fresh: true });
  const services: Service[] = [{ name: 'mail', entry: 'server/mail/catcher-main.ts' }, { name: 'api', entry: 'server/main.ts' }];
  const quiet = (line: string): boolean => line.includes('[worker] run ');
  const core = startServices(services, childEnv, { restart: false, onExit: (name, how) => { throw new Error(`${name} ${how}`); } });
  // No worker yet, so health answers 503 (degraded); wait only until the API answers at all.
  for (let i = 0; i < 120; i += 1) {
    const up = await fetch(`${env.appOrigin}/api/health`).then(() => true, () => false);
    if (up) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-bench').initialize();
  const { auth, pool } = createAuth(env);
  const [user] = await ds.query(`SELECT id FROM app_user WHERE email = 'piet@northlight.example'`);
  const cookie = auth.createSessionCookie((await auth.createSession(user.id, {})).id).serialize();
  const api = async (method: string, path: string, body?: unknown) => {
    const res = await fetch(`${env.appOrigin}/api${path}`, { method, headers: { cookie, origin: env.appOrigin, 'content-type': 'application/json' }, body: body ? JSON.stringify(body) : undefined });
    if (!res.ok) throw new Error(`${method} ${path} answered ${res.status}: ${await res.text()}`);
    return res.json() as Promise<Record<string, never>>;
  };
  const family = ((await api('GET', '/families')).families as Array<{ id: string; name: string }>).find((f) => f.name.startsWith('NL-P7 (Bi,Sb)'))!;
  const design = async (starts: number, controlPoints: number): Promise<string> =>
    ((await api('POST', '/designs', { name: `Bench ${Date.now()} ${Math.random()}`, familyId: family.id, lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints, starts })).design as { id: string }).id;
  const launch = async (designId: string): Promise<string> => ((await api('POST', `/designs/${designId}/runs`)).run as { id: string }).id;
  const waitAll = async (ids: string[]): Promise<void> => {
    for (;;) {
      const [{ n }] = await ds.query(`SELECT count(*)::int AS n FROM run WHERE id = ANY($1) AND state IN ('succeeded', 'failed', 'cancelled')`, [ids]);
      if (n === ids.length) return;
      await new Promise((r) => setTimeout(r, 100));
    }
  };
  const workers = (count: number) => startServices(Array.from({ length: count }, (_, i) => ({ name: `worker${i + 1}`, entry: 'worker/main.ts' })), childEnv, { restart: false });
  const origWrite = process.stdout.write.bind(process.stdout);
  process.stdout.write = ((chunk: string | Uint8Array) => (typeof chunk === 'string' && (quiet(chunk) || chunk.startsWith('[mail]') || chunk.startsWith('[api]') || chunk.startsWith('[worker')) ? true : origWrite(chunk))) as typeof process.stdout.write;

  console.log(`Frostgrade queue benchmark — node ${process.version}, ${new Date().toISOString()}, load average ${(await import('node:os')).loadavg().map((v) => v.toFixed(2)).join(' ')}`);
  let pool1 = workers(1);
  await new Promise((r) => setTimeout(r, 4000));

  // 1. Enqueue-to-start: one idle worker, runs launched one at a time.
  const small = await design(1, 4);
  const startLatency: number[] = [];
  for (let i = 0; i < 15; i += 1) {
    const id = await launch(small);
    await waitAll([id]);
    const [r] = await ds.query('SELECT extract(epoch FROM started_at - created_at) * 1000 AS ms FROM run WHERE id = $1', [id]);
    startLatency.push(Number(r.ms));
  }
  console.log(`enqueue → worker start (idle worker, 15 runs): p50 ${ms(pct(startLatency, 50))}, p95 ${ms(pct(startLatency, 95))}`);

  // 2. Progress latency: worker stamps each event, a watching socket receives it.
  const socket: Socket = connect(env.appOrigin, { transports: ['websocket'], extraHeaders: { cookie, origin: env.appOrigin }, reconnection: false });
  await new Promise<void>((resolve, reject) => { socket.once('connect', () => resolve()); socket.once('connect_error', reject); });
  const lags: number[] = [];
  socket.on('run:progress', (p: RunProgress) => lags.push(Date.now() - Date.parse(p.at)));
  const longRun = await launch(await design(400, 11));
  await new Promise((r) => socket.emit('watch', `run:${longRun}`, r));
  await waitAll([longRun]);
  socket.disconnect();
  console.log(`progress worker → browser socket (${lags.length} events, one 400-start run): p50 ${ms(pct(lags, 50))}, p95 ${ms(pct(lags, 95))}`);

  // 3. Throughput with 1, then 2 workers: 12 runs of 2 starts × 6 nodes each.
  const batch = await design(2, 6);
  for (const count of [1, 2]) {
    if (count === 2) { await pool1.stop(); pool1 = workers(2); await new Promise((r) => setTimeout(r, 4000)); }
    const t0 = Date.now();
    const ids: string[] = [];
    for (let i = 0; i < 12; i += 1) ids.push(await launch(batch));
    await waitAll(ids);
    const minutes = (Date.now() - t0) / 60000;
    console.log(`throughput with ${count} worker${count > 1 ? "s" : ""}: 12 runs in ${(minutes * 60).toFixed(1)} s = ${(12 / minutes).toFixed(1)} runs/min`);
  }
  process.stdout.write = origWrite;
  await pool1.stop();
  await core.stop();
  await pool.end();
  await ds.destroy();
}

main().then(() => process.exit(0), (err: Error) => {
  console.error(`bench failed: ${err.message}`);
  process.exit(1);
});
