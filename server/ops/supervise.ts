import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { log } from './log';

export type Service = { name: string; entry: string; args?: string[]; env?: Record<string, string> };

export type SuperviseOptions = {
  /** Start a child again when it exits on its own (default true). */
  restart?: boolean;
  /** Give up after this many unexpected exits of one service within `windowMs` (default 5 in 2 minutes). */
  maxExits?: number;
  windowMs?: number;
  /** First restart delay, doubling with each recent exit up to 30 s (default 1 s). */
  firstDelayMs?: number;
  /** Told of every unexpected exit (the test runner counts them as failures). */
  onExit?: (name: string, how: string) => void;
  /** Told of every restart scheduled, with its delay. */
  onRestart?: (name: string, delayMs: number) => void;
  /** Told once when a service keeps crashing; the caller decides what to stop. */
  onGiveUp?: (name: string, reason: string) => void;
};

export type Stack = { stop: () => Promise<void>; pid: (name: string) => number | undefined };

const root = join(__dirname, '..', '..');
/** Backoff before a restart: 1 s, doubling with each recent crash, at most 30 s. */
const maxDelayMs = 30_000;
/** A worker hands its run back within its 15 s graceful stop; then it is killed. */
const forceAfterMs = 20_000;

function describeExit(code: number | null, signal: NodeJS.Signals | null): string {
  if (signal) return `killed by ${signal}${signal === 'SIGKILL' ? ' (out of memory, or killed by hand)' : ''}`;
  return `exited with code ${code}`;
}

/**
 * Runs each service as its own process (node with tsx's loader, so signals
 * reach it directly), prefixes its output with its name, and keeps it
 * running: a child that exits on its own is started again after a backoff
 * that grows with each recent crash. A service that keeps crashing — more
 * than `maxExits` in `windowMs` — is given up on, with the reason and its last
 * lines of output, instead of looping for ever.
 */
export function startServices(services: Service[], env: NodeJS.ProcessEnv, o: SuperviseOptions = {}): Stack {
  const restart = o.restart ?? true;
  const maxExits = o.maxExits ?? 5;
  const windowMs = o.windowMs ?? 120_000;
  const firstDelayMs = o.firstDelayMs ?? 1000;
  let stopping = false;
  const live = new Map<string, ChildProcess>();
  const pending = new Set<ReturnType<typeof setTimeout>>();

  const run = (s: Service, exits: number[], tail: string[]): void => {
    const child = s.entry === 'npx'
      ? spawn('npx', s.args ?? [], { cwd: root, env: { ...env, ...s.env }, stdio: ['ignore', 'pipe', 'pipe'] })
      : spawn(process.execPath, ['--require', 'tsx/cjs', s.entry, ...(s.args ?? [])], { cwd: root, env: { ...env, ...s.env }, stdio: ['ignore', 'pipe', 'pipe'] });
    live.set(s.name, child);
    const relay = (chunk: Buffer): void => {
      for (const line of chunk.toString().split('\n')) {
        if (!line.trim()) continue;
        tail.push(line);
        if (tail.length > 8) tail.shift();
        process.stdout.write(line.startsWith('[') ? `${line}\n` : `[${s.name}] ${line}\n`);
      }
    };
    child.stdout?.on('data', relay);
    child.stderr?.on('data', relay);
    child.on('exit', (code, signal) => {
      if (live.get(s.name) === child) live.delete(s.name);
      if (stopping) return;
      const how = describeExit(code, signal);
      o.onExit?.(s.name, how);
      if (!restart) return;
      const now = Date.now();
      const recent = [...exits.filter((t) => now - t < windowMs), now];
      if (recent.length > maxExits) {
        const reason = `${s.name} stopped ${recent.length} times within ${Math.round(windowMs / 1000)} s (last: ${how}); not restarting it again. Its last output:\n  ${tail.join('\n  ')}`;
        log('supervisor', reason);
        o.onGiveUp?.(s.name, reason);
        return;
      }
      const delay = Math.min(maxDelayMs, firstDelayMs * 2 ** (recent.length - 1));
      log('supervisor', `${s.name} ${how}; restarting it in ${delay < 1000 ? `${delay} ms` : `${(delay / 1000).toFixed(0)} s`} (${recent.length} of ${maxExits} restarts allowed within ${Math.round(windowMs / 1000)} s)`);
      o.onRestart?.(s.name, delay);
      const timer = setTimeout(() => {
        pending.delete(timer);
        if (!stopping) run(s, recent, tail);
      }, delay);
      pending.add(timer);
    });
  };
  for (const s of services) run(s, [], []);

  const stop = async (): Promise<void> => {
    stopping = true;
    for (const t of pending) clearTimeout(t);
    await Promise.all([...live.values()].map((c) => new Promise<void>((resolve) => {
      if (c.exitCode !== null || c.signalCode !== null) return resolve();
      const force = setTimeout(() => c.kill('SIGKILL'), forceAfterMs);
      c.once('exit', () => { clearTimeout(force); resolve(); });
      c.kill('SIGTERM');
    })));
  };
  return { stop, pid: (name) => live.get(name)?.pid };
}

/** The long-running processes of a stack: mail catcher, API, and `workers` workers. */
export function stackServices(workers = 1): Service[] {
  const named = workers === 0 ? [] : workers === 1 ? [{ name: 'worker', entry: 'worker/main.ts' }] : Array.from({ length: workers }, (_, i) => ({ name: `worker${i + 1}`, entry: 'worker/main.ts' }));
  return [
    { name: 'mail', entry: 'server/mail/catcher-main.ts' },
    { name: 'api', entry: 'server/main.ts' },
    ...named,
  ];
}
