/**
 * Upload figures for `npm run bench` (printed, never asserted): for a
 * realistic full grid, the hostile sparse files and the largest files
 * accepted, the time `POST /api/families/upload/preview` takes, the API
 * process's peak resident memory while it works (its threads included), and
 * the slowest `GET /api/health` answered meanwhile (how long the event loop
 * was away). It stands up its own database, API and mail catcher; ports and
 * cluster follow PORT, SMTP_PORT, PG_PORT and PG_DATA_ROOT when set.
 */
import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { createAuth } from '../../server/auth/auth-pool';
import { readEnv } from '../../server/config/env';
import { createDataSource } from '../../server/db/data-source';
import { prepareDatabase } from '../../server/ops/database';
import { stopCluster } from '../../server/ops/postgres';
import { startServices } from '../../server/ops/supervise';
import { fullGridCsv, sparseGridCsv } from '../server/fixtures/table-files';

const pgPort = process.env.PG_PORT ?? '54339';
const settings = {
  FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test', PORT: process.env.PORT ?? '8393', SMTP_PORT: process.env.SMTP_PORT ?? '2593',
  DATABASE_URL: `postgres://postgres@127.0.0.1:${pgPort}/frostgrade_bench_uploads`,
};
const childEnv = { ...process.env, ...settings } as NodeJS.ProcessEnv;
const env = readEnv(childEnv);

/** Resident memory of a process, MB, from /proc (Linux). */
const rssMb = (pid: number): number => Number(/VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1] ?? NaN) / 1024;
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** The same 20,000-row grid, padded to just under the 5 MB upload limit by a notes column the parser ignores. */
function paddedToLimit(): string {
  const [head, ...rows] = fullGridCsv(100, 200).trimEnd().split('\n');
  const note = 'x'.repeat(Math.floor((4.9 * 1024 * 1024) / rows.length) - rows[0]!.length - 2);
  return `${[`${head},notes`, ...rows.map((r) => `${r},${note}`)].join('\n')}\n`;
}

async function main(): Promise<void> {
  const { cluster } = await prepareDatabase(env, { fresh: true });
  const stack = startServices([{ name: 'mail', entry: 'server/mail/catcher-main.ts' }, { name: 'api', entry: 'server/main.ts' }], childEnv, { restart: false, onExit: (name, how) => { throw new Error(`${name} ${how}`); } });
  const apiPid = stack.pid('api')!;
  for (let i = 0; i < 120; i += 1) {
    if (await fetch(`${env.appOrigin}/api/health`).then(() => true, () => false)) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  const ds = await createDataSource(env.databaseUrl, 'frostgrade-bench').initialize();
  const { auth, pool } = createAuth(env);
  const [user] = await ds.query(`SELECT id FROM app_user WHERE email = 'piet@northlight.example'`);
  const c = auth.createSessionCookie((await auth.createSession(user.id, {})).id);
  const cookie = `${c.name}=${c.value}`;

  const preview = async (csv: string): Promise<{ ms: number; status: number; peakMb: number; slowestHealthMs: number; note: string }> => {
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'bench.csv');
    let done = false;
    let peakMb = rssMb(apiPid);
    const sampler = setInterval(() => { peakMb = Math.max(peakMb, rssMb(apiPid)); }, 10);
    let slowestHealthMs = 0;
    const prober = (async () => {
      while (!done) {
        const t = performance.now();
        await fetch(`${env.appOrigin}/api/health`).then((r) => r.arrayBuffer());
        slowestHealthMs = Math.max(slowestHealthMs, performance.now() - t);
      }
    })();
    const t0 = performance.now();
    const res = await fetch(`${env.appOrigin}/api/families/upload/preview`, { method: 'POST', headers: { cookie, origin: env.appOrigin }, body: form });
    const body = (await res.json()) as { ok?: boolean; errors?: Array<{ message: string }> };
    const ms = performance.now() - t0;
    done = true;
    await prober;
    clearInterval(sampler);
    const note = res.status === 200 ? (body.ok ? 'accepted' : `not saveable: ${body.errors?.[0]?.message.slice(0, 50)}…`) : `refused: ${body.errors?.[0]?.message.slice(0, 70)}…`;
    return { ms, status: res.status, peakMb, slowestHealthMs, note };
  };

  const cases: Array<[string, string]> = [
    ['full grid 30 dopings × 40 temperatures (1,200 rows)', fullGridCsv(30, 40)],
    ['sparse 2,000 rows, all dopings and temperatures different', sparseGridCsv(2000)],
    ['sparse 6,000 rows, all dopings and temperatures different', sparseGridCsv(6000)],
    ['sparse 200 rows at the doping cap (40,000-cell grid, 39,800 holes)', sparseGridCsv(200)],
    ['largest grid accepted: 100 × 200 (20,000 rows)', fullGridCsv(100, 200)],
    ['largest file accepted: the 20,000 rows padded to 4.9 MB', paddedToLimit()],
  ];
  // The children's own log lines would interleave with the figures.
  const origWrite = process.stdout.write.bind(process.stdout);
  process.stdout.write = ((chunk: string | Uint8Array) => (typeof chunk === 'string' && /^\[(api|mail)\]/.test(chunk) ? true : origWrite(chunk))) as typeof process.stdout.write;
  console.log(`Frostgrade upload benchmark — node ${process.version}, ${new Date().toISOString()}, load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}`);
  await preview(fullGridCsv(4, 4)); // first thread start compiles the parser; not counted
  console.log(`API resident memory at rest: ${rssMb(apiPid).toFixed(0)} MB`);
  for (const [name, csv] of cases) {
    const runs = [];
    for (let i = 0; i < 3; i += 1) runs.push(await preview(csv));
    const last = runs[runs.length - 1]!;
    console.log(`${name}, ${(csv.length / 1024).toFixed(0)} KB: HTTP ${last.status}, median ${median(runs.map((r) => r.ms)).toFixed(0)} ms, API peak RSS ${Math.max(...runs.map((r) => r.peakMb)).toFixed(0)} MB, slowest health meanwhile ${Math.max(...runs.map((r) => r.slowestHealthMs)).toFixed(0)} ms — ${last.note}`);
  }
  process.stdout.write = origWrite;
  await stack.stop();
  await pool.end();
  await ds.destroy();
  if (cluster?.startedHere) stopCluster(cluster);
}

main().then(() => process.exit(0), (err: Error) => {
  console.error(`bench failed: ${err.message}`);
  process.exit(1);
});
