import type { DopingProblem } from '../engine/doping-problem';
import { mulberry32 } from '../random';
import { scoreLayout } from './zoning';
import type { ZoneLayout } from './zoned-leg';

/** As-grown legs simulated per zone count: enough for a yield to ±2 % (1σ of a binomial at 50 %, N = 600). */
export const YIELD_SAMPLES = 600;
/** The grower's typical doping scatter when nobody has entered one, decades (1σ). */
export const DEFAULT_DOPING_SCATTER = 0.05;
/** Histogram bins of the simulated objective. */
const BINS = 16;

/** The Monte Carlo estimate of how often an as-grown leg meets the loss budget. */
export type YieldEstimate = {
  /** Doping scatter used: each zone's log10 n drawn independently, N(target, σ²), decades. */
  scatterDecades: number;
  samples: number;
  seed: number;
  /** Fraction of simulated legs losing at most `budget` against the design (0…1). */
  meetsBudget: number;
  budget: number;
  /** The design's objective (ΔT in K for maxDeltaT) and the simulated distribution's summary. */
  target: number;
  mean: number;
  p05: number;
  p50: number;
  p95: number;
  /** Legs that had no steady state at the design current (counted as failing). */
  infeasible: number;
  /**
   * Equal-width bins from the 2nd percentile to the largest value (so a long
   * tail of a wide scatter does not squash the bulk into a few bins): `edges`
   * has one more entry than `counts`; `below` legs lie under the first edge.
   */
  histogram: { edges: number[]; counts: number[]; below: number };
};

/** Standard normal deviates from a uniform generator (Box–Muller; the pair's second value is kept for the next call). */
function normalFrom(uniform: () => number): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) { const s = spare; spare = null; return s; }
    const u = Math.max(uniform(), 1e-300);
    const r = Math.sqrt(-2 * Math.log(u));
    const a = 2 * Math.PI * uniform();
    spare = r * Math.sin(a);
    return r * Math.cos(a);
  };
}

const quantile = (sorted: readonly number[], q: number): number => {
  if (sorted.length === 0) return NaN;
  const i = q * (sorted.length - 1);
  const lo = Math.floor(i);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo]! + (i - lo) * (sorted[hi]! - sorted[lo]!);
};

export type YieldOptions = { samples?: number; seed?: number; onProgress?: (done: number, total: number) => void; shouldStop?: () => boolean };

/**
 * Monte Carlo of as-grown legs: every zone's doping drawn around its target
 * with the grower's scatter (log-normal: scatter in decades), each leg
 * re-solved at the design's current (a cooler runs at its set current) by the
 * same scoreLayout the zoning and the bands use, so whatever that builds into
 * a leg (contacts among it) is in here too. Zone boundaries are taken as
 * exact. Seeded, so a sheet's yield is reproducible.
 */
export function estimateYield(p: DopingProblem, layout: ZoneLayout, target: { value: number; current: number }, budget: number, scatterDecades: number, o: YieldOptions = {}): YieldEstimate {
  const samples = o.samples ?? YIELD_SAMPLES;
  const seed = o.seed ?? 1409 + layout.log10.length;
  const normal = normalFrom(mulberry32(seed));
  const lo = p.family.minLog10Doping;
  const hi = p.family.maxLog10Doping;
  const values: number[] = [];
  let infeasible = 0;
  let meets = 0;
  for (let i = 0; i < samples; i += 1) {
    if (o.shouldStop?.()) break;
    const log10 = layout.log10.map((y) => Math.min(hi, Math.max(lo, y + scatterDecades * normal())));
    const s = scoreLayout(p, { ...layout, log10 }, target.current);
    if (!s.feasible) infeasible += 1;
    else {
      values.push(s.value);
      if (target.value - s.value <= budget) meets += 1;
    }
    if (o.onProgress && (i + 1) % 25 === 0) o.onProgress(i + 1, samples);
  }
  const n = values.length + infeasible;
  const sorted = [...values].sort((a, b) => a - b);
  const min = Math.min(sorted.length > 0 ? quantile(sorted, 0.02) : target.value, target.value - budget);
  const max = Math.max(sorted[sorted.length - 1] ?? target.value, target.value);
  const width = max > min ? (max - min) / BINS : 1;
  const counts = Array<number>(BINS).fill(0);
  let below = 0;
  for (const v of sorted) {
    if (v < min) below += 1;
    else counts[Math.min(BINS - 1, Math.floor((v - min) / width))]! += 1;
  }
  return {
    scatterDecades, samples: n, seed, meetsBudget: n > 0 ? meets / n : 0, budget, target: target.value,
    mean: values.reduce((a, v) => a + v, 0) / Math.max(values.length, 1),
    p05: quantile(sorted, 0.05), p50: quantile(sorted, 0.5), p95: quantile(sorted, 0.95),
    infeasible,
    histogram: { edges: Array.from({ length: BINS + 1 }, (_, b) => min + b * width), counts, below },
  };
}
