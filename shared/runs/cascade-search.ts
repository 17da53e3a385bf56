import { CaseError, runCascade, type CascadeResult, type CascadeStart, type CheckedCascadeCase } from '../engine';
import { generator, SearchStoppedEarly, type SearchOptionsOf } from './global-search';

/**
 * Multi-start search over a cascade's currents and couple shares, as
 * globalSearch does for a leg's doping: start 0 from the engine's own start,
 * the others from seeded random currents (0.1–2 × each stage's reference
 * current, as the engine scales them) and random shares of the couples; the
 * best result is kept. Same seed, same starts: a resumed run explores them
 * again identically.
 */
export type CascadeCheckpoint = { nextStart: number; bestStart: number; best: CascadeResult | null };

export type CascadeSearchResult = { result: CascadeResult; stopped: boolean; startsDone: number; bestStart: number; evaluations: number };

/** Larger is better: ΔT for maxDeltaT, −power for minPower. */
const score = (r: CascadeResult) => (r.objective === 'maxDeltaT' ? r.deltaT : -r.power);

/** Something to vary: a free current or couple counts to optimise. */
const searchable = (c: CheckedCascadeCase) => c.currents.some((v) => v === null) || c.optimizeCouples !== null;

function randomStart(c: CheckedCascadeCase, rnd: () => number, best: CascadeResult): CascadeStart {
  const shared = 0.3 + 1.2 * rnd();
  const currents = best.stages.map((s, k) => {
    const fixed = c.wiring === 'series' ? c.currents[0] : c.currents[k];
    return fixed ?? s.current * (c.wiring === 'series' ? shared : 0.3 + 1.2 * rnd());
  });
  const counts = c.optimizeCouples ? best.stages.map((s) => Math.max(1, s.couples * (0.4 + 1.2 * rnd()))) : best.stages.map((s) => s.couples);
  return { currents, counts };
}

export function cascadeSearch(c: CheckedCascadeCase, o: SearchOptionsOf<CascadeCheckpoint>): CascadeSearchResult {
  const starts = searchable(c) ? o.starts : 1;
  let best = o.resume?.best ?? null;
  let bestStart = o.resume?.bestStart ?? 0;
  let evaluations = 0;
  let stopped = false;
  let k = o.resume?.nextStart ?? 0;
  for (; k < starts; k += 1) {
    if (o.shouldStop?.()) { stopped = true; break; }
    const start = k > 0 && best ? randomStart(c, generator(o.seed, k), best) : undefined;
    const earlier = best;
    let halted = false;
    let r: CascadeResult;
    try {
    r = runCascade(c, {
      start,
      shouldStop: () => {
        halted = halted || (o.shouldStop?.() ?? false);
        return halted;
      },
      onProgress: (p) => {
        const value = c.objective === 'maxDeltaT' ? p.objective : -p.objective;
        const keep = earlier && score(earlier) > value ? earlier : null;
        o.onProgress?.({
          start: k, starts, phase: p.phase, iteration: p.iteration, objective: p.objective,
          best: keep ? (c.objective === 'maxDeltaT' ? keep.deltaT : keep.power) : p.objective,
          bestCurrent: keep ? keep.stages[0].current : (p.currents[0] ?? null),
          startBest: p.objective, state: null, evaluations: evaluations + p.evaluations,
          fractionDone: Math.min(1, (k + (p.phase === 'couples' ? 0.7 : 0.3)) / starts),
        });
      },
    });
    } catch (e) {
      // A random start that finds no steady state is only a bad start; the first start's error is the case's.
      if (!(e instanceof CaseError) || !best) throw e;
      o.onCheckpoint?.({ nextStart: k + 1, bestStart, best });
      continue;
    }
    evaluations += r.evaluations;
    if (!best || score(r) > score(best)) {
      best = r;
      bestStart = k;
    }
    if (halted) { stopped = true; k += 1; break; }
    // One event per finished start: a series cascade at fixed counts has a
    // single free current, which the least-power search settles without any
    // iteration of its own to report.
    const value = (x: CascadeResult) => (c.objective === 'maxDeltaT' ? x.deltaT : x.power);
    o.onProgress?.({
      start: k, starts, phase: 'start finished', iteration: 0, objective: value(r), best: value(best), bestCurrent: best.stages[0].current,
      startBest: value(r), state: null, evaluations, fractionDone: Math.min(1, (k + 1) / starts),
    });
    o.onCheckpoint?.({ nextStart: k + 1, bestStart, best });
  }
  if (!best) throw new SearchStoppedEarly();
  return { result: best, stopped, startsDone: Math.min(k, starts), bestStart, evaluations };
}
