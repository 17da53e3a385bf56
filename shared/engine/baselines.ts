/**
 * The two reference legs every doping optimisation reports, so the gain of
 * grading is visible:
 * - the best uniform doping (doping and current optimised together);
 * - the local-best-zT leg: at every point the doping that maximises zT at the
 *   local temperature, iterated until the doping and the temperature profile
 *   it produces agree (current optimised at every pass). This is the usual
 *   recipe, and it is the wrong target for cooling.
 */
import { minimizeBox } from './box-bfgs';
import { newWarmStart, referenceCurrent, scoreDesign, type DesignScore, type WarmStart } from './evaluate-design';
import { currentIsFree, legFor, type Counter, type DopingProblem } from './doping-problem';
import { ztOptimalLog10 } from './family-helpers';
import { equallySpacedNodes, uniformLeg, type Leg } from './leg-profile';
import { brentMinimize } from './minimize-scalar';
import { optimizeCurrent } from './optimize-current';
import { solveLegProblem } from './solve-leg';

export type UniformBaseline = { log10: number; score: DesignScore };

export type LocalZtBaseline = {
  x: number[];
  log10: number[];
  score: DesignScore;
  /** Passes of the self-consistency loop, and whether it settled. */
  iterations: number;
  converged: boolean;
};

/** Score a leg, optimising the current when it is free. */
export function scoreWithBestCurrent(problem: DopingProblem, leg: Leg, counter: Counter, warm: WarmStart): DesignScore {
  if (currentIsFree(problem)) {
    const r = optimizeCurrent(leg, problem.conditions, problem.tolerance, warm);
    counter.evaluations += r.evaluations;
    return r.score;
  }
  counter.evaluations++;
  return scoreDesign(leg, problem.current ?? 0, problem.conditions, warm, problem.tolerance);
}

/** Doping grid for the first look; 9 points over two decades is a quarter decade apart. */
const UNIFORM_SCAN = 9;

export function bestUniform(problem: DopingProblem, counter: Counter): UniformBaseline {
  const { lower, upper } = problem;
  const leg = (y: number) => uniformLeg(problem.length, problem.area, problem.family, y);
  const warm = newWarmStart(leg(lower));
  let best: UniformBaseline | undefined;
  const points = upper > lower ? UNIFORM_SCAN : 1;
  for (let k = 0; k < points; k++) {
    const y = points === 1 ? lower : lower + ((upper - lower) * k) / (points - 1);
    const score = scoreWithBestCurrent(problem, leg(y), counter, warm);
    if (score.feasible && (!best || score.value > best.score.value)) best = { log10: y, score };
  }
  if (!best) throw new Error('no uniform doping within the bounds gives a steady state');
  if (points === 1) return best;
  const spacing = (upper - lower) / (points - 1);
  const scale = Math.max(Math.abs(best.score.value), 1e-30);
  if (currentIsFree(problem)) {
    // Doping and current together; the current in units of S̄·Th/R̄ keeps both variables O(1).
    const reference = referenceCurrent(leg(best.log10), problem.conditions.hotSide);
    const start = best;
    let top = best;
    const f = (v: readonly number[]) => {
      counter.evaluations++;
      const s = scoreDesign(leg(v[0]), v[1] * reference, problem.conditions, warm, problem.tolerance);
      if (s.feasible && s.value > top.score.value) top = { log10: v[0], score: s };
      return s.feasible ? -s.value / scale : Infinity;
    };
    minimizeBox(f, [start.log10, start.score.current / reference], {
      lower: [Math.max(lower, start.log10 - spacing), 1e-3],
      upper: [Math.min(upper, start.log10 + spacing), 50],
      steps: [1e-4, 1e-4],
      gradientTolerance: 1e-7,
      valueTolerance: 1e-10,
      initialStep: 0.1,
    });
    return top;
  }
  let top = best;
  const f = (y: number) => {
    const s = scoreWithBestCurrent(problem, leg(y), counter, warm);
    if (s.feasible && s.value > top.score.value) top = { log10: y, score: s };
    return s.feasible ? -s.value : Number.MAX_VALUE;
  };
  brentMinimize(f, Math.max(lower, best.log10 - spacing), Math.min(upper, best.log10 + spacing), 1e-5);
  return top;
}

/** Nodes of the local-best-zT leg: finer than the design grid, so the leg follows n_opt(T(x)) closely. */
const LOCAL_ZT_NODES = 21;
const LOCAL_ZT_PASSES = 40;
/** Converged when no node temperature moves more than this between passes [K]. */
const LOCAL_ZT_SETTLED = 1e-6;

export function localBestZt(problem: DopingProblem, uniform: UniformBaseline, counter: Counter): LocalZtBaseline {
  const { family, lower, upper, conditions } = problem;
  const x = equallySpacedNodes(Math.max(problem.controlPoints, LOCAL_ZT_NODES));
  const hot = conditions.hotSide;
  const cold = uniform.score.coldSide;
  // First guess of the temperature profile: the uniform leg's ends joined linearly.
  let temperatures = x.map((f) => cold + f * (hot - cold));
  let result: LocalZtBaseline | undefined;
  const warm = newWarmStart(legFor(problem, x, x.map(() => uniform.log10)));
  for (let pass = 1; pass <= LOCAL_ZT_PASSES; pass++) {
    const log10 = temperatures.map((t) => ztOptimalLog10(family, t, lower, upper));
    const leg = legFor(problem, x, log10);
    const score = scoreWithBestCurrent(problem, leg, counter, warm);
    if (!score.feasible) break;
    result = { x, log10, score, iterations: pass, converged: false };
    const solution = solveLegProblem({ leg, hotSide: hot, current: score.current, heatLoad: score.heatLoad }, { tolerance: problem.tolerance, estimateError: false, profilePoints: 2 });
    counter.evaluations++;
    const next = x.map((f) => {
      const at = f * problem.length;
      const k = solution.profile.x.findIndex((px) => Math.abs(px - at) <= 1e-12 * problem.length);
      return solution.profile.temperature[k];
    });
    const moved = Math.max(...next.map((t, k) => Math.abs(t - temperatures[k])));
    temperatures = next;
    if (moved <= LOCAL_ZT_SETTLED) {
      result.converged = true;
      break;
    }
  }
  if (!result) throw new Error('the local-best-zT leg has no steady state');
  return result;
}
