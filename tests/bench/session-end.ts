/**
 * Session-end figures for `npm run bench` (printed, never asserted): how long
 * after an admin sends a role change or a removal, or the member signs out,
 * signs out everywhere or changes their password, the member's browser socket
 * is closed by the server (NOTIFY at commit → socket server → disconnect).
 * Its own database on the test cluster (PG_PORT / PG_DATA_ROOT respected);
 * the API and the socket server run in this process, as in the server tests.
 */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { io as connect, type Socket } from 'socket.io-client';
import { createAuth } from '../../server/auth/auth-pool';
import { hashPassword } from '../../server/auth/passwords';
import { readEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { createApp } from '../../server/http/app';
import { createMailer } from '../../server/mail/mailer';
import { prepareDatabase } from '../../server/ops/database';
import { stopCluster } from '../../server/ops/postgres';
import { startBoss } from '../../server/queue/boss';
import { attachRealtime } from '../../server/realtime/socket-server';
import { watchRules } from '../../server/realtime/watch-rules';

const base = readEnv({ ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test' });
const env = { ...base, databaseUrl: `postgres://postgres@127.0.0.1:${base.pgPort}/frostgrade_bench_sessions` };
const rounds = 20;

const pct = (xs: number[], p: number): number => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))] ?? NaN;
const ms = (v: number): string => `${v.toFixed(0)} ms`;

async function main(): Promise<void> {
  const { cluster } = await prepareDatabase(env, { fresh: true });
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-bench').initialize();
  const boss = await startBoss(env.databaseUrl, 'frostgrade-bench', [env.runQueue]);
  const mailer = createMailer(env);
  const { auth, pool } = createAuth(env);
  const http = createServer(createApp({ env, ds, boss, mailer, auth, version: 'bench' }));
  const realtime = await attachRealtime(http, { auth, databaseUrl: env.databaseUrl, appOrigin: env.appOrigin, allowLoopback: false }, watchRules(ds));
  await new Promise<void>((r) => http.listen(0, '127.0.0.1', r));
  const url = `http://127.0.0.1:${(http.address() as AddressInfo).port}`;
  const cookieOf = async (userId: string) => auth.createSessionCookie((await auth.createSession(userId, {})).id).serialize();
  const [admin] = await ds.query(`SELECT id, team_id FROM app_user WHERE email = 'ada@northlight.example'`);
  const adminCookie = await cookieOf(admin.id);
  const send = (method: string, path: string, body?: unknown, cookie = adminCookie) =>
    fetch(`${url}/api${path}`, { method, headers: { cookie, origin: env.appOrigin, 'content-type': 'application/json' }, body: body ? JSON.stringify(body) : undefined });
  const memberPassword = 'a bench member passphrase';
  const memberHash = await hashPassword(memberPassword);

  /** A fresh member with an open socket, straight into the database (no invitation mail needed here). */
  const member = async (): Promise<{ id: string; cookie: string; socket: Socket }> => {
    const id = randomBytes(15).toString('base64url');
    await ds.query(`INSERT INTO app_user (id, team_id, email, display_name, password_hash, role) VALUES ($1, $2, $3, 'Bench member', $4, 'viewer')`, [id, admin.team_id, `bench.${id}@example.test`, memberHash]);
    const cookie = await cookieOf(id);
    const socket = connect(url, { transports: ['websocket'], extraHeaders: { cookie, origin: env.appOrigin }, reconnection: false, forceNew: true });
    await new Promise<void>((resolve, reject) => { socket.once('connect', () => resolve()); socket.once('connect_error', reject); });
    return { id, cookie, socket };
  };
  /** Milliseconds from sending the request to the server closing the socket. */
  const lag = async (act: (id: string, cookie: string) => Promise<Response>): Promise<number> => {
    const { id, cookie, socket } = await member();
    const closed = new Promise<number>((resolve) => socket.once('disconnect', () => resolve(performance.now())));
    const t0 = performance.now();
    const res = await act(id, cookie);
    if (!res.ok) throw new Error(`answered ${res.status}: ${await res.text()}`);
    const lagMs = (await closed) - t0;
    socket.disconnect();
    return lagMs;
  };

  console.log(`Frostgrade session-end benchmark — node ${process.version}, ${new Date().toISOString()}, load average ${(await import('node:os')).loadavg().map((v) => v.toFixed(2)).join(' ')}`);
  for (const [label, act] of [
    ['role change', (id: string) => send('PUT', `/team/members/${id}/role`, { role: 'physicist' })],
    ['removal', (id: string) => send('DELETE', `/team/members/${id}`)],
    ['sign-out', (_id: string, cookie: string) => send('POST', '/auth/sign-out', undefined, cookie)],
    ['sign out everywhere', (_id: string, cookie: string) => send('POST', '/auth/sign-out-everywhere', undefined, cookie)],
    // Includes verifying the current password and hashing the new one (argon2, twice).
    ['password change', (_id: string, cookie: string) => send('POST', '/auth/password', { currentPassword: memberPassword, newPassword: 'a new bench passphrase' }, cookie)],
  ] as const) {
    const lags: number[] = [];
    for (let i = 0; i < rounds; i += 1) lags.push(await lag(act));
    console.log(`${label} sent → member's socket closed (${rounds} members): p50 ${ms(pct(lags, 50))}, p95 ${ms(pct(lags, 95))}, max ${ms(Math.max(...lags))}`);
  }
  await realtime.close();
  await new Promise<void>((r) => http.close(() => r()));
  mailer.close();
  await pool.end();
  await boss.stop({ graceful: false, wait: true });
  await ds.destroy();
  if (cluster?.startedHere) stopCluster(cluster);
}

main().then(() => process.exit(0), (err: Error) => {
  console.error(`bench failed: ${err.message}`);
  process.exit(1);
});
