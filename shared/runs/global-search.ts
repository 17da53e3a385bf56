import { dopingBaselines, optimizeLeg, type CheckedCase, type OptimizeResult, type OptimizerState } from '../engine';
import { mulberry32 } from '../random';

/**
 * Multi-start search over the doping profile. The engine's optimiser is
 * local (a quasi-Newton method from the baselines and one start); a graded
 * leg can have several local optima, so a run repeats it from `starts`
 * different profiles — the first from the engine's own choice, the others
 * drawn at random within the bounds — and keeps the best. The draw is seeded
 * by the run, so a run resumed from a checkpoint explores the same starts.
 */
export type SearchCheckpoint = { nextStart: number; bestStart: number; best: OptimizeResult | null };

export type SearchProgress = {
  start: number;
  starts: number;
  phase: string;
  iteration: number;
  objective: number;
  /** Best objective of the whole search so far, and the current [A] of the design that holds it. */
  best: number;
  bestCurrent: number | null;
  /** Best objective of this start so far, and its point (doping, current). */
  startBest: number;
  state: OptimizerState | null;
  evaluations: number;
  /** Estimated fraction of the search done (0–1). */
  fractionDone: number;
};

/** A multi-start search's options, for any checkpoint type (leg, couple and cascade searches share it). */
export type SearchOptionsOf<C> = {
  starts: number;
  seed: string;
  resume?: C | null;
  shouldStop?: () => boolean;
  onProgress?: (p: SearchProgress) => void;
  /** After each completed start: enough to resume. */
  onCheckpoint?: (cp: C) => void;
};

export type SearchOptions = SearchOptionsOf<SearchCheckpoint>;

/** Stopped (cancelled, shut down) before any start produced a design: there is nothing to keep. */
export class SearchStoppedEarly extends Error {
  constructor() {
    super('the search was stopped before its first start finished');
    this.name = 'SearchStoppedEarly';
  }
}

export type SearchResult = { result: OptimizeResult; stopped: boolean; startsDone: number; bestStart: number; evaluations: number };

/** A generator per (run, start): the seed string and the start index hashed into mulberry32's seed. */
export function generator(seed: string, start: number): () => number {
  let a = start * 0x9e3779b1;
  for (let i = 0; i < seed.length; i += 1) a = Math.imul(a ^ seed.charCodeAt(i), 0x85ebca6b) >>> 0;
  return mulberry32(a);
}

/** A random profile within the bounds (sorted like the best so far when the profile must be monotone). */
function randomStart(c: CheckedCase, rnd: () => number, best: OptimizeResult): OptimizerState | undefined {
  if (c.leg.kind !== 'family' || !c.leg.bounds || !best.doping) return undefined;
  const { lower, upper } = c.leg.bounds;
  const nodes = best.doping.perCm3.map(() => 10 ** (lower + (upper - lower) * rnd()));
  if (c.leg.monotone) {
    const rising = best.doping.perCm3[best.doping.perCm3.length - 1]! >= best.doping.perCm3[0]!;
    nodes.sort((p, q) => (rising ? p - q : q - p));
  }
  return { kind: 'doping', perCm3: nodes, current: best.current };
}

/** Estimated share of one local optimisation done after `iteration` iterations (they converge in tens). */
const withinStart = (phase: string, iteration: number): number => (phase === 'profile' ? 0.15 + 0.85 * (1 - Math.exp(-iteration / 20)) : 0.1);

export function globalSearch(c: CheckedCase, o: SearchOptions): SearchResult {
  // Only a doping profile has local optima worth searching; a constant material needs one start.
  const starts = c.leg.kind === 'family' && c.leg.material.kind !== 'constant' ? o.starts : 1;
  let best = o.resume?.best ?? null;
  let bestStart = o.resume?.bestStart ?? 0;
  let evaluations = 0;
  let stopped = false;
  let k = o.resume?.nextStart ?? 0;
  // The baselines do not depend on the start: compute them once for the whole search.
  const baselines = starts > 1 || k > 0 ? dopingBaselines(c) : null;
  if (baselines) evaluations += baselines.evaluations;
  for (; k < starts; k += 1) {
    if (o.shouldStop?.()) { stopped = true; break; }
    const start = k > 0 && best ? randomStart(c, generator(o.seed, k), best) : undefined;
    const current = best;
    const r = optimizeLeg(c, {
      start,
      baselines,
      // Start 0 also searches from both baselines; the later ones from their random profile alone.
      startOnly: k > 0,
      shouldStop: o.shouldStop,
      onProgress: (p) => {
        // The run's best is this start's only when it beats every earlier start; else it is the
        // earlier best, at its own current, not the current this start is trying.
        const earlier = current && current.objective.value > p.best ? current : null;
        o.onProgress?.({
          start: k, starts, phase: p.phase, iteration: p.iteration, objective: p.objective,
          best: earlier ? earlier.objective.value : p.best, bestCurrent: earlier ? earlier.current : (p.state?.current ?? null),
          startBest: p.best, state: p.state, evaluations: evaluations,
          fractionDone: Math.min(1, (k + withinStart(p.phase, p.iteration)) / starts),
        });
      },
    });
    evaluations += r.evaluations;
    if (!best || r.objective.value > best.objective.value) {
      // Baselines do not depend on the start: keep the first ones so every start compares alike.
      best = best ? { ...r, baselines: best.baselines } : r;
      bestStart = k;
    }
    if (r.stopped) { stopped = true; k += 1; break; }
    o.onCheckpoint?.({ nextStart: k + 1, bestStart, best });
  }
  if (!best) throw new SearchStoppedEarly();
  return { result: best, stopped, startsDone: Math.min(k, starts), bestStart, evaluations };
}
