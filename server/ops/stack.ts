import { spawn, type ChildProcess } from 'node:child_process';
import { createConnection } from 'node:net';
import { join } from 'node:path';
import { log } from './log';

export type Service = { name: string; entry: string; args?: string[]; env?: Record<string, string> };
export type Stack = { children: ChildProcess[]; stop: () => Promise<void> };

const root = join(__dirname, '..', '..');

export function portInUse(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const s = createConnection({ port, host });
    s.once('connect', () => { s.destroy(); resolve(true); });
    s.once('error', () => resolve(false));
  });
}

/**
 * Starts each service as its own process (tsx runs the TypeScript sources),
 * with output prefixed by the service's name. If one dies unexpectedly,
 * `onCrash` is told so the caller can shut the rest down.
 */
export function startServices(services: Service[], env: NodeJS.ProcessEnv, onCrash: (name: string, code: number | null) => void): Stack {
  let stopping = false;
  const children = services.map((s) => {
    const child = s.entry === 'npx'
      ? spawn('npx', s.args ?? [], { cwd: root, env: { ...env, ...s.env }, stdio: ['ignore', 'pipe', 'pipe'] })
      // node with tsx's loader rather than the tsx wrapper: one process per service, signals go straight to it.
      : spawn(process.execPath, ['--require', 'tsx/cjs', s.entry, ...(s.args ?? [])], { cwd: root, env: { ...env, ...s.env }, stdio: ['ignore', 'pipe', 'pipe'] });
    const relay = (chunk: Buffer): void => {
      for (const line of chunk.toString().split('\n')) if (line.trim()) process.stdout.write(line.startsWith('[') ? `${line}\n` : `[${s.name}] ${line}\n`);
    };
    child.stdout?.on('data', relay);
    child.stderr?.on('data', relay);
    child.on('exit', (code) => {
      if (!stopping) onCrash(s.name, code);
    });
    return child;
  });
  const stop = async (): Promise<void> => {
    stopping = true;
    await Promise.all(children.map((c) => new Promise<void>((resolve) => {
      if (c.exitCode !== null || c.signalCode !== null) return resolve();
      const force = setTimeout(() => c.kill('SIGKILL'), 10000);
      c.once('exit', () => { clearTimeout(force); resolve(); });
      c.kill('SIGTERM');
    })));
  };
  return { children, stop };
}

/** Polls the health route until every check passes (or gives up with the last answer). */
export async function waitForHealth(url: string, seconds: number): Promise<void> {
  const deadline = Date.now() + seconds * 1000;
  let last = '';
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url);
      last = await res.text();
      if (res.ok) return;
    } catch (err) {
      last = err instanceof Error ? err.message : String(err);
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`stack not healthy after ${seconds} s: ${last}`);
}

export function stackServices(): Service[] {
  return [
    { name: 'mail', entry: 'server/mail/catcher-main.ts' },
    { name: 'api', entry: 'server/main.ts' },
    { name: 'worker', entry: 'worker/main.ts' },
  ];
}

export { log };
