import type { RunCheckpoint } from '../server/runs/run-lifecycle';
import type { SearchProgress } from '../shared/runs/global-search';

/** What the worker hands its engine thread. */
export type ThreadInput = {
  /** Which search: a leg (globalSearch), a matched couple (coupleSearch) or a cascade (cascadeSearch). */
  kind: 'leg' | 'couple' | 'cascade';
  case: Record<string, unknown>;
  starts: number;
  seed: string;
  /** The checkpoint of this run's kind of search. */
  resume: RunCheckpoint | null;
  /** Int32Array(1) over this buffer: 1 = stop and keep the best so far. */
  stopFlag: SharedArrayBuffer;
};

export type ThreadMessage =
  | { type: 'progress'; progress: SearchProgress }
  | { type: 'checkpoint'; checkpoint: RunCheckpoint }
  /** `result` (the kind's engine output) is null only when stopped before the first start finished. */
  | { type: 'done'; result: object | null; stopped: boolean; startsDone: number; bestStart: number }
  | { type: 'error'; message: string; field?: string };
