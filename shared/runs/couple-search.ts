import { CaseError } from '../engine/case-error';
import type { CheckedCoupleCase, CoupleLegCase } from '../engine/couple-case';
import type { CoupleState } from '../engine/optimize-couple';
import { runCouple, type CoupleResult } from '../engine/run-couple-case';
import { generator, SearchStoppedEarly, type SearchOptionsOf } from './global-search';

/**
 * Multi-start search over a matched couple, as globalSearch is over one leg:
 * the couple optimiser is local, and with two graded profiles, a current and
 * a ratio it can stop in different optima. Start 0 is the engine's own
 * choice (each leg's best uniform doping, the matched ratio, the best
 * current); the others draw each optimised profile at random within its
 * bounds (seeded by the run, so a resumed run explores the same starts) with
 * the best design's current and ratio. A couple with no optimised profile
 * has nothing random to draw: one start.
 */
export type CoupleCheckpoint = { nextStart: number; bestStart: number; best: CoupleResult | null };

export type CoupleSearchResult = { result: CoupleResult; stopped: boolean; startsDone: number; bestStart: number; evaluations: number };

/** Random log10 nodes within a leg's bounds, ordered like the best profile when the leg must be monotone. */
function randomProfile(l: CoupleLegCase, rnd: () => number, best: { perCm3: number[] } | null): number[] | null {
  const profile = l.profile;
  if (!profile) return null;
  const nodes = Array.from({ length: profile.controlPoints }, () => profile.lower + (profile.upper - profile.lower) * rnd());
  if (profile.monotone && best) {
    const rising = best.perCm3[best.perCm3.length - 1]! >= best.perCm3[0]!;
    nodes.sort((p, q) => (rising ? p - q : q - p));
  }
  return nodes;
}

function randomStart(c: CheckedCoupleCase, rnd: () => number, best: CoupleResult): CoupleState {
  return { p: randomProfile(c.p, rnd, best.p.doping), n: randomProfile(c.n, rnd, best.n.doping), current: best.current, areaRatio: best.areaRatio };
}

/** Estimated share of one start done after `iteration` iterations (they converge in tens). */
const withinStart = (iteration: number): number => 0.15 + 0.85 * (1 - Math.exp(-iteration / 20));

export function coupleSearch(c: CheckedCoupleCase, o: SearchOptionsOf<CoupleCheckpoint>): CoupleSearchResult {
  const starts = c.p.profile || c.n.profile ? o.starts : 1;
  let best = o.resume?.best ?? null;
  let bestStart = o.resume?.bestStart ?? 0;
  let evaluations = 0;
  let stopped = false;
  let k = o.resume?.nextStart ?? 0;
  for (; k < starts; k += 1) {
    if (o.shouldStop?.()) {
      stopped = true;
      break;
    }
    const start = k > 0 && best ? randomStart(c, generator(o.seed, k), best) : undefined;
    const earlier = best;
    let r: CoupleResult;
    try {
      r = runCouple(c, {
        start,
        startOnly: start !== undefined,
        shouldStop: o.shouldStop,
        onProgress: (p) => {
          // The run's best is this start's only when it beats every earlier start.
          const previous = earlier && earlier.objective.value > p.best ? earlier : null;
          o.onProgress?.({
            start: k,
            starts,
            phase: 'couple',
            iteration: p.iteration,
            objective: p.objective,
            best: previous ? previous.objective.value : p.best,
            bestCurrent: previous ? previous.current : p.state.current,
            startBest: p.best,
            state: p.state.p ? { kind: 'doping', perCm3: p.state.p.map((v) => 10 ** v), current: p.state.current } : null,
            evaluations,
            fractionDone: Math.min(1, (k + withinStart(p.iteration)) / starts),
          });
        },
      });
    } catch (e) {
      // Stopped before this start had a design: keep what earlier starts found.
      if (e instanceof CaseError && o.shouldStop?.()) {
        stopped = true;
        break;
      }
      throw e;
    }
    evaluations += r.evaluations;
    if (!best || r.objective.value > best.objective.value) {
      best = r;
      bestStart = k;
    }
    if (o.shouldStop?.()) {
      stopped = true;
      k += 1;
      break;
    }
    o.onCheckpoint?.({ nextStart: k + 1, bestStart, best });
  }
  if (!best) throw new SearchStoppedEarly();
  return { result: best, stopped, startsDone: Math.min(k, starts), bestStart, evaluations };
}
