import type { OptimizeResult } from '../shared/engine';
import type { SearchCheckpoint, SearchProgress } from '../shared/runs/global-search';

/** What the worker hands its engine thread. */
export type ThreadInput = {
  case: Record<string, unknown>;
  starts: number;
  seed: string;
  resume: SearchCheckpoint | null;
  /** Int32Array(1) over this buffer: 1 = stop and keep the best so far. */
  stopFlag: SharedArrayBuffer;
};

export type ThreadMessage =
  | { type: 'progress'; progress: SearchProgress }
  | { type: 'checkpoint'; checkpoint: SearchCheckpoint }
  /** `result` is null only when stopped before the first start finished. */
  | { type: 'done'; result: OptimizeResult | null; stopped: boolean; startsDone: number; bestStart: number }
  | { type: 'error'; message: string; field?: string };
