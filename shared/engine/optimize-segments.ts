/**
 * Segmented legs: optimise the segment fractions (and the current when it is
 * free) with the same box quasi-Newton method. Fractions are parametrised by
 * stick-breaking, b_k = b_{k−1} + (1 − b_{k−1})·t_k for the interfaces with
 * t ∈ [0, 1], so any box point is a valid split (a segment may shrink to
 * nothing) and the fractions always add up to 1.
 */
import { minimizeBox } from './box-bfgs';
import { newWarmStart, referenceCurrent, scoreDesign, type Conditions, type DesignScore } from './evaluate-design';
import type { LegEnds } from './leg-ends';
import { segmentedLeg, withEnds, type Segment } from './leg-profile';
import { optimizeCurrent } from './optimize-current';

export type SegmentProblem = {
  segments: Segment[];
  length: number;
  area: number;
  conditions: Conditions;
  freeFractions: boolean;
  current?: number;
  tolerance: number;
  /** Contacts of each junction and parasitic heat; absent = ideal. */
  ends?: LegEnds;
};

export type SegmentOptimum = { fractions: number[]; score: DesignScore; iterations: number; evaluations: number; stopped: boolean };

export type SegmentRunOptions = {
  onProgress?: (p: { iteration: number; objective: number; best: number; state: { fractions: number[]; current: number } }) => void;
  shouldStop?: () => boolean;
  start?: { fractions: number[]; current: number };
};

export function fractionsFrom(t: readonly number[]): number[] {
  const fractions: number[] = [];
  let b = 0;
  for (const tk of t) {
    const next = b + (1 - b) * tk;
    fractions.push(next - b);
    b = next;
  }
  fractions.push(1 - b);
  return fractions;
}

export function fractionsTo(fractions: readonly number[]): number[] {
  const t: number[] = [];
  let b = 0;
  for (let k = 0; k + 1 < fractions.length; k++) {
    t.push(b >= 1 ? 0 : Math.min(1, Math.max(0, fractions[k] / (1 - b))));
    b += fractions[k];
  }
  return t;
}

const withFractions = (segments: readonly Segment[], fractions: readonly number[]) => segments.map((s, k) => ({ ...s, fraction: fractions[k] }));

export function optimizeSegments(problem: SegmentProblem, options: SegmentRunOptions = {}): SegmentOptimum {
  const { segments, length, area, conditions, tolerance } = problem;
  const leg = (fractions: readonly number[]) => withEnds(segmentedLeg(length, area, withFractions(segments, fractions)), problem.ends);
  const startFractions = options.start?.fractions ?? segments.map((s) => s.fraction);
  const freeCurrent = problem.current === undefined && conditions.objective !== 'maxCop';
  let evaluations = 0;
  const warm = newWarmStart(leg(startFractions));
  if (!problem.freeFractions || segments.length === 1) {
    if (freeCurrent) {
      const r = optimizeCurrent(leg(startFractions), conditions, tolerance, warm);
      return { fractions: startFractions, score: r.score, iterations: 0, evaluations: r.evaluations, stopped: false };
    }
    const score = scoreDesign(leg(startFractions), problem.current ?? 0, conditions, warm, tolerance);
    return { fractions: startFractions, score, iterations: 0, evaluations: 1, stopped: false };
  }
  const initial = freeCurrent ? optimizeCurrent(leg(startFractions), conditions, tolerance, warm) : { score: scoreDesign(leg(startFractions), problem.current ?? 0, conditions, warm, tolerance), evaluations: 1 };
  evaluations += initial.evaluations;
  let best: SegmentOptimum = { fractions: startFractions, score: initial.score, iterations: 0, evaluations: 0, stopped: false };
  const reference = referenceCurrent(leg(startFractions), conditions.hotSide);
  const scale = Math.max(Math.abs(initial.score.value), 1e-30);
  const n = segments.length - 1;
  const current0 = options.start?.current ?? initial.score.current;
  let iterations = 0;
  const f = (v: readonly number[]) => {
    evaluations++;
    const fractions = fractionsFrom(v.slice(0, n));
    const current = freeCurrent ? v[n] * reference : (problem.current ?? 0);
    const score = scoreDesign(leg(fractions), current, conditions, warm, tolerance);
    if (score.feasible && score.value > best.score.value) best = { ...best, fractions, score };
    return score.feasible ? -score.value / scale : score.value === -Infinity ? Infinity : 1 - score.value;
  };
  const v0 = [...fractionsTo(startFractions), ...(freeCurrent ? [current0 / reference] : [])];
  const lower = v0.map((_, i) => (i < n ? 0 : 1e-3));
  const upper = v0.map((_, i) => (i < n ? 1 : 50));
  const result = minimizeBox(f, v0, {
    lower,
    upper,
    steps: v0.map(() => 1e-5),
    gradientTolerance: 1e-7,
    valueTolerance: 1e-11,
    initialStep: 0.1,
    maxIterations: 400,
    shouldStop: options.shouldStop,
    onIteration: (_it, _v, value) => {
      iterations++;
      options.onProgress?.({ iteration: iterations, objective: -value * scale, best: best.score.value, state: { fractions: best.fractions, current: best.score.current } });
    },
  });
  return { ...best, iterations, evaluations, stopped: result.reason === 'stopped' };
}

/** Baseline for segmented legs: the best single segment material over the whole length (current optimised). */
export function bestSingleSegment(problem: SegmentProblem): { segment: number; score: DesignScore; evaluations: number } {
  let best: { segment: number; score: DesignScore; evaluations: number } | undefined;
  let evaluations = 0;
  problem.segments.forEach((s, k) => {
    const leg = withEnds(segmentedLeg(problem.length, problem.area, [{ ...s, fraction: 1 }]), problem.ends);
    const r =
      problem.current === undefined && problem.conditions.objective !== 'maxCop'
        ? optimizeCurrent(leg, problem.conditions, problem.tolerance)
        : { score: scoreDesign(leg, problem.current ?? 0, problem.conditions, newWarmStart(leg), problem.tolerance), evaluations: 1 };
    evaluations += r.evaluations;
    if (!best || (r.score.feasible && r.score.value > best.score.value)) best = { segment: k, score: r.score, evaluations: 0 };
  });
  const out = best as { segment: number; score: DesignScore; evaluations: number };
  return { ...out, evaluations };
}
