import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { io as connect, type Socket } from 'socket.io-client';
import { controlCluster } from '../../server/ops/postgres';

const root = join(__dirname, '..', '..');

/**
 * A whole `npm start` (server/ops/launch.js start) on its own cluster and
 * ports, as a user runs it: its supervisor, API, worker and mail catcher,
 * and a PostgreSQL the test may stop and start. The fault tests kill its
 * processes and restart its database and check what a user would see.
 */
export type NpmStart = {
  origin: string;
  dataDir: string;
  output: string[];
  /** Resolves with the first output line matching `re` after `from` (an index into `output`). */
  waitFor: (re: RegExp, seconds: number, from?: number) => Promise<string>;
  /** Ctrl-C: SIGINT to the whole process group, as a terminal sends it; resolves with the exit code. */
  interrupt: () => Promise<number | null>;
  /** Pids of the supervised children, found by their entry file among the stack's descendants. */
  pidOf: (entry: 'worker/main.ts' | 'server/main.ts') => number[];
};

export type NpmStartSettings = { pgDataRoot: string; pgPort: number; port: number; smtpPort: number; env?: Record<string, string> };

/**
 * Ports and a data directory for a private `npm start`, set apart from the
 * test stack's own (PORT, PG_PORT, SMTP_PORT as `npm test` was given them)
 * by `offset`, so two test runs on other ports never share them.
 */
export function privateStack(name: string, offset: number, env: Record<string, string> = {}): NpmStartSettings {
  const port = Number(process.env.PORT ?? 8341);
  const pgPort = Number(process.env.PG_PORT ?? 54339);
  const smtpPort = Number(process.env.SMTP_PORT ?? 2526);
  return { pgDataRoot: `/var/tmp/frostgrade-${name}-${pgPort + offset}`, pgPort: pgPort + offset, port: port + offset, smtpPort: smtpPort + offset, env };
}

/** Stops a cluster a previous, crashed run may have left and removes it, so every test run starts clean. */
export function freshDataRoot(pgDataRoot: string): void {
  const dataDir = join(pgDataRoot, 'dev', 'pgdata');
  if (existsSync(join(dataDir, 'postmaster.pid'))) {
    try {
      controlCluster(dataDir, 'stop');
    } catch {
      // Already stopped: the pid file is stale, and goes with the directory.
    }
  }
  rmSync(pgDataRoot, { recursive: true, force: true });
}

function descendants(pid: number): Array<{ pid: number; args: string }> {
  const rows = execFileSync('ps', ['-e', '-o', 'pid=,ppid=,args='], { encoding: 'utf8' }).split('\n').map((l) => /^\s*(\d+)\s+(\d+)\s+(.*)$/.exec(l)).filter((m): m is RegExpExecArray => m !== null);
  const out: Array<{ pid: number; args: string }> = [];
  const walk = (p: number): void => {
    for (const m of rows) {
      if (Number(m[2]) === p) {
        out.push({ pid: Number(m[1]), args: m[3]! });
        walk(Number(m[1]));
      }
    }
  };
  walk(pid);
  return out;
}

export function npmStart(s: NpmStartSettings): Promise<NpmStart> {
  const env: NodeJS.ProcessEnv = {
    ...process.env, PG_DATA_ROOT: s.pgDataRoot, PG_PORT: String(s.pgPort), PORT: String(s.port), SMTP_PORT: String(s.smtpPort),
    FROSTGRADE_PROFILE: 'dev', NODE_ENV: 'development' as const, ...s.env,
  };
  // Its own process group, like a terminal's foreground job, so Ctrl-C can be sent to all of it.
  const child: ChildProcess = spawn(process.execPath, ['server/ops/launch.js', 'start'], { cwd: root, env, detached: true, stdio: ['ignore', 'pipe', 'pipe'] });
  const output: string[] = [];
  const listeners = new Set<() => void>();
  const onData = (b: Buffer): void => {
    for (const line of b.toString().split('\n')) if (line.trim()) output.push(line);
    for (const l of listeners) l();
  };
  child.stdout?.on('data', onData);
  child.stderr?.on('data', onData);
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));

  const waitFor = (re: RegExp, seconds: number, from = 0): Promise<string> => new Promise((resolve, reject) => {
    const check = (): boolean => {
      const hit = output.slice(from).find((l) => re.test(l));
      if (hit === undefined) return false;
      listeners.delete(check);
      clearTimeout(timer);
      resolve(hit);
      return true;
    };
    const timer = setTimeout(() => { listeners.delete(check); reject(new Error(`no line matching ${re} within ${seconds} s; output ends:\n${output.slice(-25).join('\n')}`)); }, seconds * 1000);
    listeners.add(check);
    check();
  });

  const handle: NpmStart = {
    origin: `http://127.0.0.1:${s.port}`,
    dataDir: join(s.pgDataRoot, 'dev', 'pgdata'),
    output,
    waitFor,
    interrupt: async () => {
      if (child.exitCode === null && child.signalCode === null) process.kill(-child.pid!, 'SIGINT');
      return exited;
    },
    pidOf: (entry) => descendants(child.pid!).filter((p) => p.args.includes(entry)).map((p) => p.pid),
  };
  // A start that fails (a port in use, a migration error) exits at once: say so instead of waiting out the timeout.
  const failedStart = exited.then((code) => { throw new Error(`npm start exited with code ${code} before it was ready:\n${output.slice(-15).join('\n')}`); });
  return Promise.race([waitFor(/\[frostgrade\] ready in/, 300), failedStart]).then(() => handle, async (err: Error) => {
    await handle.interrupt();
    throw err;
  });
}

/** A browser-like API client of the stack: signs in once through the real route and keeps the cookie. */
export async function signIn(origin: string, email: string, password = 'graded-legs-demo'): Promise<{ cookie: string; api: <T>(method: string, path: string, body?: unknown) => Promise<{ status: number; body: T }> }> {
  const res = await fetch(`${origin}/api/auth/sign-in`, { method: 'POST', headers: { origin, 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
  const cookie = (res.headers.get('set-cookie') ?? '').split(';')[0]!;
  const api = async <T>(method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> => {
    const r = await fetch(`${origin}/api${path}`, { method, headers: { cookie, origin, 'content-type': 'application/json' }, body: body === undefined ? undefined : JSON.stringify(body) });
    const text = await r.text();
    return { status: r.status, body: (text ? JSON.parse(text) : null) as T };
  };
  return { cookie, api };
}

export async function socketOf(origin: string, cookie: string): Promise<Socket> {
  const s = connect(origin, { transports: ['websocket'], extraHeaders: { origin, cookie }, reconnection: true, reconnectionDelay: 200, forceNew: true });
  await new Promise<void>((resolve, reject) => { s.once('connect', () => resolve()); s.once('connect_error', reject); });
  return s;
}
