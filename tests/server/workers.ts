import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import type { DataSource } from 'typeorm';
import { eventually } from './context';

const root = join(__dirname, '..', '..');

export type SpawnedWorker = { child: ChildProcess; pid: number; output: string[] };

/** Starts a real worker process on a private queue, so a test controls which workers see its runs. */
export function spawnWorker(queue: string, staleSeconds = 3, env: Record<string, string> = {}): Promise<SpawnedWorker> {
  // node itself with tsx's loader, so the child's pid is the worker's (it appears in worker_id).
  const child = spawn(process.execPath, ['--require', 'tsx/cjs', 'worker/main.ts'], {
    cwd: root,
    env: { ...process.env, FROSTGRADE_PROFILE: 'test', NODE_ENV: 'test', RUN_QUEUE: queue, RUN_STALE_SECONDS: String(staleSeconds), ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`worker did not start: ${output.join('')}`)), 30000);
    const onData = (b: Buffer): void => {
      output.push(b.toString());
      if (b.toString().includes('ready')) {
        clearTimeout(timer);
        resolve({ child, pid: child.pid!, output });
      }
    };
    child.stdout.on('data', onData);
    child.stderr.on('data', (b: Buffer) => output.push(b.toString()));
    child.once('exit', (code) => reject(new Error(`worker exited with ${code}: ${output.join('')}`)));
  });
}

export async function stopWorker(w: SpawnedWorker): Promise<void> {
  if (w.child.exitCode !== null || w.child.signalCode !== null) return;
  await new Promise<void>((resolve) => {
    const force = setTimeout(() => w.child.kill('SIGKILL'), 20000);
    w.child.once('exit', () => { clearTimeout(force); resolve(); });
    w.child.kill('SIGTERM');
  });
}

/**
 * Waits until a run has a saved checkpoint past its second start and names
 * the worker holding it (its pid is in worker_id), so a test can kill that
 * worker mid-run and watch the run resume elsewhere.
 */
export async function checkpointHolder(ds: DataSource, workers: SpawnedWorker[], runId: string, seconds = 120): Promise<{ workerId: string; victim: SpawnedWorker | undefined }> {
  const cp = await eventually(async () => {
    const [row] = (await ds.query('SELECT worker_id, checkpoint FROM run WHERE id = $1', [runId])) as Array<{ worker_id: string; checkpoint: { nextStart: number } | null }>;
    return row?.checkpoint && row.checkpoint.nextStart >= 2 ? row : undefined;
  }, seconds);
  return { workerId: cp.worker_id, victim: workers.find((w) => cp.worker_id.includes(`:${w.pid}:`)) };
}
