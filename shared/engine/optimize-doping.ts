/**
 * Doping-profile optimisation: log10 n at equally spaced nodes (piecewise
 * linear between them) and, when free, the current, maximised by the
 * box-constrained quasi-Newton method from several starts — the best
 * uniform leg, the local-best-zT leg, and any caller-supplied start (a
 * checkpoint to resume from). The best design found so far is kept and
 * reported through onProgress; shouldStop ends the run early with it.
 *
 * Monotone profiles use a "stick-breaking" parametrisation with box bounds
 * only: y₀ = lo + (hi − lo)·t₀, y_k = y_{k−1} + (hi − y_{k−1})·t_k, t ∈ [0, 1]
 * (mirrored for decreasing profiles), so every point of the box is a
 * monotone profile inside the doping bounds and vice versa. Both directions
 * are tried; the better wins.
 */
import { minimizeBox } from './box-bfgs';
import { implicitGradient, newWarmStart, referenceCurrent, scoreDesign, type DesignPoint, type DesignScore } from './evaluate-design';
import { currentIsFree, legFor, nodeFractions, type Counter, type DopingProblem } from './doping-problem';
import { profileAt } from './leg-profile';
import { scoreWithBestCurrent, type LocalZtBaseline, type UniformBaseline } from './baselines';

export type Progress = {
  /** Iterations so far over all starts. */
  iteration: number;
  /** Objective at the current iterate (ΔT [K], heat load [W] or COP). */
  objective: number;
  /** Best objective found so far. */
  best: number;
  /** The best design so far: resume from it by passing it back as `start`. */
  state: DopingState;
};

/** A resumable point: node dopings (log10 cm⁻³) and the current [A]. */
export type DopingState = { log10: number[]; current: number };

export type DopingOptimum = {
  x: number[];
  log10: number[];
  score: DesignScore;
  iterations: number;
  stopped: boolean;
};

/** Node profile ↔ box variables (also used by optimize-couple.ts). */
export type Parametrisation = {
  toProfile: (v: readonly number[]) => number[];
  fromProfile: (y: readonly number[]) => number[];
  lower: number[];
  upper: number[];
};

export function freeParametrisation(n: number, lo: number, hi: number): Parametrisation {
  return { toProfile: (v) => [...v], fromProfile: (y) => y.map((v) => Math.min(hi, Math.max(lo, v))), lower: Array(n).fill(lo), upper: Array(n).fill(hi) };
}

function increasingFrom(t: readonly number[], lo: number, hi: number): number[] {
  const y: number[] = [];
  let prev = lo;
  t.forEach((tk, k) => {
    prev = k === 0 ? lo + (hi - lo) * tk : prev + (hi - prev) * tk;
    y.push(prev);
  });
  return y;
}

function increasingTo(y: readonly number[], lo: number, hi: number): number[] {
  return y.map((v, k) => {
    const base = k === 0 ? lo : y[k - 1];
    return hi - base <= 0 ? 0 : Math.min(1, Math.max(0, (v - base) / (hi - base)));
  });
}

/** Pool-adjacent-violators: the closest non-decreasing sequence (least squares). */
export function isotonic(y: readonly number[]): number[] {
  const blocks: { sum: number; count: number }[] = [];
  for (const v of y) {
    blocks.push({ sum: v, count: 1 });
    while (blocks.length > 1 && blocks[blocks.length - 2].sum / blocks[blocks.length - 2].count > blocks[blocks.length - 1].sum / blocks[blocks.length - 1].count) {
      const last = blocks.pop() as { sum: number; count: number };
      blocks[blocks.length - 1].sum += last.sum;
      blocks[blocks.length - 1].count += last.count;
    }
  }
  return blocks.flatMap((b) => Array<number>(b.count).fill(b.sum / b.count));
}

export function monotoneParametrisation(n: number, lo: number, hi: number, increasing: boolean): Parametrisation {
  const flip = (y: readonly number[]) => [...y].reverse();
  return {
    toProfile: (t) => (increasing ? increasingFrom(t, lo, hi) : flip(increasingFrom(t, lo, hi))),
    fromProfile: (y) => {
      const ordered = increasing ? [...y] : flip(y);
      return increasingTo(
        isotonic(ordered).map((v) => Math.min(hi, Math.max(lo, v))),
        lo,
        hi,
      );
    },
    lower: Array(n).fill(0),
    upper: Array(n).fill(1),
  };
}

/** Step of the implicit-gradient differences (replayed integrations are smooth, so it can be small). */
const GRADIENT_STEP = 1e-6;

export type DopingRunOptions = {
  onProgress?: (p: Progress) => void;
  shouldStop?: () => boolean;
  start?: DopingState;
  /**
   * Search from `start` alone, not also from the two baselines. A multi-start
   * search sets this after its first start: the local search from a baseline
   * is deterministic, so repeating it at every start only repeats work.
   */
  startOnly?: boolean;
};

export function optimizeDoping(problem: DopingProblem, uniform: UniformBaseline, localZt: LocalZtBaseline, counter: Counter, options: DopingRunOptions = {}): DopingOptimum {
  const x = nodeFractions(problem);
  const n = x.length;
  const { lower: lo, upper: hi } = problem;
  const freeCurrent = currentIsFree(problem);
  const reference = referenceCurrent(legFor(problem, x, x.map(() => uniform.log10)), problem.conditions.hotSide);
  const scale = Math.max(Math.abs(uniform.score.value), 1e-30);
  const warm = newWarmStart(legFor(problem, x, x.map(() => uniform.log10)));

  let best: DopingOptimum = { x, log10: x.map(() => uniform.log10), score: uniform.score, iterations: 0, stopped: false };
  let iterations = 0;
  const consider = (log10: number[], score: DesignScore) => {
    if (score.feasible && score.value > best.score.value) best = { ...best, log10, score };
  };

  const starts: DopingState[] = [
    { log10: x.map(() => uniform.log10), current: uniform.score.current },
    { log10: x.map((f) => profileAt(localZt.x, localZt.log10, f)), current: localZt.score.current },
  ];
  if (options.start && options.startOnly) starts.splice(0, starts.length, options.start);
  else if (options.start) starts.unshift(options.start);

  const parametrisations = problem.monotone ? [monotoneParametrisation(n, lo, hi, true), monotoneParametrisation(n, lo, hi, false)] : [freeParametrisation(n, lo, hi)];
  for (const p of parametrisations) {
    for (const start of starts) {
      if (options.shouldStop?.()) return { ...best, iterations, stopped: true };
      const current0 = problem.current ?? start.current;
      const v0 = [...p.fromProfile(start.log10), ...(freeCurrent ? [current0 / reference] : [])];
      const lower = [...p.lower, ...(freeCurrent ? [1e-3] : [])];
      const upper = [...p.upper, ...(freeCurrent ? [50] : [])];
      const design = (v: readonly number[]): DesignPoint => ({
        leg: legFor(problem, x, p.toProfile(v.slice(0, n))),
        current: freeCurrent ? v[n] * reference : (problem.current ?? 0),
      });
      // The last point scored and its shooting root, for the implicit gradient there.
      let last: { v: number[]; root: number } | undefined;
      const f = (v: readonly number[]) => {
        counter.evaluations++;
        const point = design(v);
        const score = scoreDesign(point.leg, point.current, problem.conditions, warm, problem.tolerance);
        consider(p.toProfile(v.slice(0, n)), score);
        const root = problem.conditions.objective === 'maxHeatLoad' ? score.heatLoad / problem.area : score.coldSide;
        last = { v: [...v], root: score.feasible ? root : NaN };
        return score.feasible ? -score.value / scale : score.value === -Infinity ? Infinity : 1 - score.value;
      };
      const gradient = (v: readonly number[]): number[] | undefined => {
        if (!last || !Number.isFinite(last.root) || last.v.some((vi, i) => vi !== v[i])) return undefined;
        counter.evaluations++;
        const g = implicitGradient(
          design(v),
          last.root,
          problem.conditions,
          problem.tolerance,
          (i) => {
            const step = v[i] + GRADIENT_STEP <= upper[i] ? GRADIENT_STEP : -GRADIENT_STEP;
            const moved = [...v];
            moved[i] += step;
            return { point: design(moved), step };
          },
          v.length,
        );
        return g?.map((d) => -d / scale);
      };
      // A search's random start comes with somebody else's current: at it the
      // profile may have no steady state or a cold end hotter than the hot
      // one, where the search crawls through slow, failing solves. Give the
      // start its own best current first (a 1-D search), or skip it.
      if (freeCurrent && options.startOnly) {
        const own = scoreWithBestCurrent(problem, legFor(problem, x, p.toProfile(v0.slice(0, n))), counter, warm);
        consider(p.toProfile(v0.slice(0, n)), own);
        if (!own.feasible) continue;
        v0[n] = Math.min(upper[n], Math.max(lower[n], own.current / reference));
      }
      const result = minimizeBox(f, v0, {
        lower,
        upper,
        steps: lower.map(() => 1e-4),
        gradient,
        gradientTolerance: 1e-6,
        valueTolerance: 1e-10,
        initialStep: 0.1,
        maxIterations: 300,
        shouldStop: options.shouldStop,
        onIteration: (_it, _v, value) => {
          iterations++;
          options.onProgress?.({
            iteration: iterations,
            objective: -value * scale,
            best: best.score.value,
            state: { log10: [...best.log10], current: best.score.current },
          });
        },
      });
      if (result.reason === 'stopped') return { ...best, iterations, stopped: true };
    }
  }
  return { ...best, iterations, stopped: false };
}

/** Score one node profile at a given current (used by sensitivity and resumption). */
export function scoreProfile(problem: DopingProblem, log10: readonly number[], current: number): DesignScore {
  const x = nodeFractions(problem);
  const leg = legFor(problem, x, log10);
  return scoreDesign(leg, current, problem.conditions, newWarmStart(leg), problem.tolerance);
}
