/**
 * Soak figures for `npm run bench` (printed, never asserted). A real
 * `npm start` with two workers on its own cluster and ports, and dozens of
 * simulated signed-in users on loopback browsing, previewing uploads,
 * launching short runs and watching their progress for a few minutes, while
 * one worker is killed with SIGKILL and PostgreSQL is stopped and started
 * once. Printed: requests served, latency p50/p95, answers by status (503s
 * during the outage counted apart), runs launched and runs lost (must be 0),
 * and the API process's peak memory.
 *
 * SOAK_SECONDS (default 180) and SOAK_USERS (default 36) change the load.
 */
import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { io as connect, type Socket } from 'socket.io-client';
import { createAuth } from '../../server/auth/auth-pool';
import { readEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { controlCluster } from '../../server/ops/postgres';
import { freshDataRoot, npmStart, privateStack, type NpmStart } from '../server/npm-start';

const seconds = Number(process.env.SOAK_SECONDS ?? 180);
const userCount = Number(process.env.SOAK_USERS ?? 36);
const settings = privateStack('soak', 31, { WORKERS: '2', RUN_STALE_SECONDS: '5', TEAM_LAUNCHES_PER_MINUTE: '600' });

const pct = (xs: number[], p: number): number => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))] ?? NaN;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** A small measured-family table (6 dopings × 5 temperatures) generated from round invented numbers. */
function smallTable(): string {
  const lines = ['n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K'];
  for (const n of [1e18, 3e18, 1e19, 3e19, 1e20, 3e20]) {
    for (const t of [250, 275, 300, 325, 350]) lines.push(`${n},${t},${(300 - 60 * Math.log10(n / 1e18)) * (t / 300)},${100 * (n / 1e18) ** 0.8 * (300 / t)},${1.2 + 0.1 * (t / 300)}`);
  }
  return `${lines.join('\n')}\n`;
}

type Tally = { latencies: number[]; byStatus: Map<string, number>; outage503: number };

async function main(): Promise<void> {
  freshDataRoot(settings.pgDataRoot);
  const stack = await npmStart(settings);
  try {
    await soak(stack);
  } finally {
    await stack.interrupt();
  }
}

async function soak(stack: NpmStart): Promise<void> {
  const origin = stack.origin;
  const env = readEnv({ ...process.env, FROSTGRADE_PROFILE: 'dev', PG_PORT: String(settings.pgPort) });
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-soak').initialize();
  const { auth, pool } = createAuth(env);
  const cookieOf = async (email: string): Promise<string> => {
    const [u] = (await ds.query('SELECT id FROM app_user WHERE email = $1', [email])) as Array<{ id: string }>;
    return auth.createSessionCookie((await auth.createSession(u!.id, {})).id).serialize().split(';')[0]!;
  };
  const tally: Tally = { latencies: [], byStatus: new Map(), outage503: 0 };
  let outage = false;
  /** One request, timed to its last byte; the body comes back parsed (or null). */
  const call = async (cookie: string, method: string, path: string, body?: BodyInit, json = true): Promise<{ status: number; body: unknown } | null> => {
    const t0 = performance.now();
    try {
      const r = await fetch(`${origin}/api${path}`, { method, headers: { cookie, origin, ...(json && body ? { 'content-type': 'application/json' } : {}) }, body });
      const text = await r.text();
      tally.latencies.push(performance.now() - t0);
      const res = { status: r.status, body: text.startsWith('{') ? JSON.parse(text) as unknown : null };
      // Failures are told apart by what was asked (a busy thread gate on uploads is not an outage).
      const key = r.status < 400 ? String(r.status) : `${r.status} ${method} ${path.replace(/[0-9a-f-]{36}/g, ':id')}`;
      if (r.status === 503 && outage) tally.outage503 += 1;
      else tally.byStatus.set(key, (tally.byStatus.get(key) ?? 0) + 1);
      return res;
    } catch {
      tally.byStatus.set('no answer', (tally.byStatus.get('no answer') ?? 0) + 1);
      return null;
    }
  };

  // Two teams: Northlight's physicist and viewer, and a Harbour admin with a family and a design of its own.
  const piet = await cookieOf('piet@northlight.example');
  const vic = await cookieOf('vic@northlight.example');
  const hana = await cookieOf('hana@harbour.example');
  const family = async (cookie: string): Promise<string> => {
    const list = (await call(cookie, 'GET', '/families'))!.body as { families: Array<{ id: string; name: string }> };
    const found = list.families.find((f) => f.name.startsWith('NL-P7') || f.name === 'Harbour p-band');
    if (found) return found.id;
    const made = await call(cookie, 'POST', '/families', JSON.stringify({ name: 'Harbour p-band', source: 'soak: invented band parameters', definition: { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } }));
    return (made!.body as { family: { id: string } }).family.id;
  };
  const design = async (cookie: string, starts: number): Promise<string> => {
    const res = await call(cookie, 'POST', '/designs', JSON.stringify({ name: `Soak ${starts} starts ${Math.random().toString(36).slice(2, 7)}`, familyId: await family(cookie), lengthMm: 1.5, areaMm2: 1, hotSide: 300, minPerCm3: 1e18, maxPerCm3: 1e20, controlPoints: 5, starts }));
    return (res!.body as { design: { id: string } }).design.id;
  };
  const designs = { piet: [await design(piet, 30), await design(piet, 30), await design(piet, 150)], hana: [await design(hana, 30)] };
  const launched: string[] = [];
  const launchedBy = { piet: [] as string[], hana: [] as string[] };
  const sockets: Socket[] = [];
  let progressEvents = 0;
  const csv = smallTable();
  const end = Date.now() + seconds * 1000;

  const user = async (k: number): Promise<void> => {
    const physicist = k % 3 !== 2;
    const team = k % 6 === 5 ? 'hana' : 'piet';
    const cookie = team === 'hana' ? hana : physicist ? piet : vic;
    const socket = connect(origin, { transports: ['websocket'], extraHeaders: { cookie, origin }, reconnection: true, reconnectionDelay: 500 });
    sockets.push(socket);
    socket.on('run:progress', () => { progressEvents += 1; });
    await sleep(k * 100);
    while (Date.now() < end) {
      const roll = Math.random();
      // About one launch every few seconds in all: what two workers can keep up with, so the drain below ends.
      if (physicist && roll < 0.012) {
        const list = team === 'hana' ? designs.hana : designs.piet;
        const res = await call(cookie, 'POST', `/designs/${list[Math.floor(Math.random() * list.length)]}/runs`);
        if (res?.status === 201) {
          const id = (res.body as { run: { id: string } }).run.id;
          launched.push(id);
          launchedBy[team].push(id);
          socket.emit('watch', `run:${id}`);
        }
      } else if (physicist && team === 'piet' && roll < 0.12) {
        const form = new FormData();
        form.append('file', new Blob([csv], { type: 'text/csv' }), 'soak.csv');
        await call(cookie, 'POST', '/families/upload/preview', form, false);
      } else if (roll < 0.5) {
        await call(cookie, 'GET', roll < 0.3 ? '/runs' : '/families');
      } else if (roll < 0.8 && launchedBy[team].length > 0) {
        const own = launchedBy[team];
        await call(cookie, 'GET', `/runs/${own[Math.floor(Math.random() * own.length)]}`);
      } else {
        await call(cookie, 'GET', roll < 0.9 ? '/designs' : '/modules');
      }
      await sleep(150 + Math.random() * 350);
    }
  };

  // The API's resident memory, sampled every half second.
  const apiPid = (): number | undefined => stack.pidOf('server/main.ts')[0];
  let peakRss = 0;
  const sampler = setInterval(() => {
    const pid = apiPid();
    if (!pid) return;
    try {
      const kb = Number(/VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1] ?? 0);
      peakRss = Math.max(peakRss, kb);
    } catch {
      // The process may be between a stop and a restart; the next sample sees the new one.
    }
  }, 500);

  const faults = (async () => {
    await sleep(seconds * 1000 * 0.3);
    const [victim] = stack.pidOf('worker/main.ts');
    if (victim) process.kill(victim, 'SIGKILL');
    console.log(`t=${Math.round(seconds * 0.3)} s: worker ${victim} killed with SIGKILL`);
    await sleep(seconds * 1000 * 0.3);
    outage = true;
    controlCluster(stack.dataDir, 'stop');
    console.log(`t=${Math.round(seconds * 0.6)} s: PostgreSQL stopped`);
    await sleep(6000);
    controlCluster(stack.dataDir, 'start');
    const back = Date.now();
    for (;;) {
      const res = await fetch(`${origin}/api/health`).catch(() => null);
      if (res?.status === 200) break;
      await sleep(250);
    }
    outage = false;
    console.log(`PostgreSQL started again; health green ${((Date.now() - back) / 1000).toFixed(1)} s later`);
  })();

  console.log(`Frostgrade soak — node ${process.version}, ${new Date().toISOString()}, load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}; ${userCount} users for ${seconds} s, 2 workers`);
  await Promise.all([...Array.from({ length: userCount }, (_, k) => user(k)), faults]);
  clearInterval(sampler);

  // Drain: every launched run must end; one still unfinished after five minutes, or failed, is lost.
  const drainUntil = Date.now() + 300_000;
  let states: Array<{ state: string; n: number }> = [];
  for (;;) {
    states = (await ds.query('SELECT state, count(*)::int AS n FROM run WHERE id = ANY($1) GROUP BY state', [launched])) as Array<{ state: string; n: number }>;
    if (!states.some((s) => s.state === 'queued' || s.state === 'running') || Date.now() > drainUntil) break;
    await sleep(1000);
  }
  const count = (s: string): number => states.find((x) => x.state === s)?.n ?? 0;
  const lost = count('failed') + count('queued') + count('running') + (launched.length - states.reduce((a, s) => a + s.n, 0));
  const [{ resumed }] = (await ds.query('SELECT count(*)::int AS resumed FROM run WHERE id = ANY($1) AND attempts > 1', [launched])) as Array<{ resumed: number }>;
  const restarts = stack.output.filter((l) => l.startsWith('[supervisor]')).length;

  const served = tally.latencies.length;
  const statuses = [...tally.byStatus.entries()].sort().map(([k, v]) => `${k}: ${v}`).join(', ');
  console.log(`requests served: ${served} (${(served / seconds).toFixed(1)}/s); latency p50 ${pct(tally.latencies, 50).toFixed(0)} ms, p95 ${pct(tally.latencies, 95).toFixed(0)} ms`);
  console.log(`answers by status (failures by route): ${statuses}; 503 while PostgreSQL was down: ${tally.outage503}`);
  console.log(`runs launched: ${launched.length}; succeeded ${count('succeeded')}, cancelled ${count('cancelled')}, resumed after a lost worker ${resumed}; runs lost: ${lost}`);
  console.log(`live progress events received: ${progressEvents}; supervisor restarts: ${restarts}`);
  console.log(`API peak resident memory: ${(peakRss / 1024).toFixed(0)} MB`);
  // A 500 is a bug whatever the load: show what the API logged about each.
  const logged = stack.output.filter((l) => /^\[api\].*(Error|error)/.test(l));
  if (logged.length > 0) console.log(`API error lines (first 20 of ${logged.length}):\n  ${logged.slice(0, 20).join('\n  ')}`);

  for (const s of sockets) s.disconnect();
  await pool.end();
  await ds.destroy();
}

main().then(() => process.exit(0), (err: Error) => {
  console.error(`soak failed: ${err.stack ?? err.message}`);
  process.exit(1);
});
