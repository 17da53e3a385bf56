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
import { CaseError } from './case-error';
import { newWarmStart, referenceCurrent, scoreDesign, type DesignScore, type WarmStart } from './evaluate-design';
import { currentIsFree, legFor, type Counter, type DopingProblem } from './doping-problem';
import { ztOptimalLog10 } from './family-helpers';
import { equallySpacedNodes, uniformLeg, withEnds, type Leg } from './leg-profile';
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

/** The case cannot be run as given: name the field the user can change. */
function noSteadyState(problem: DopingProblem, what: string): CaseError {
  const table = problem.family.kind === 'table';
  return new CaseError(
    table ? 'material.rows' : problem.current !== undefined ? 'current' : 'bounds',
    `${what} steady state ${table ? "inside the table's temperature range" : 'for these conditions'}: ${table ? 'extend the table' : 'check the conditions and bounds'}`,
  );
}

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
/**
 * Relative accuracy of the scan and of the local-best-zT passes: they only
 * choose a starting point or settle a profile, and at 1e-7 a solve needs
 * 2.5× fewer steps than at the default 1e-9. The reported baselines are
 * re-scored at the problem's own tolerance.
 */
const SCOUT_TOLERANCE = 1e-7;

export function bestUniform(problem: DopingProblem, counter: Counter): UniformBaseline {
  const { lower, upper } = problem;
  const leg = (y: number) => withEnds(uniformLeg(problem.length, problem.area, problem.family, y), problem.ends);
  const warm = newWarmStart(leg(lower));
  let best: UniformBaseline | undefined;
  const points = upper > lower ? UNIFORM_SCAN : 1;
  const scout = { ...problem, tolerance: Math.max(problem.tolerance, SCOUT_TOLERANCE) };
  const scoutWarm = newWarmStart(leg(lower));
  for (let k = 0; k < points; k++) {
    const y = points === 1 ? lower : lower + ((upper - lower) * k) / (points - 1);
    const score = scoreWithBestCurrent(scout, leg(y), counter, scoutWarm);
    if (score.feasible && (!best || score.value > best.score.value)) best = { log10: y, score };
  }
  if (!best) throw noSteadyState(problem, 'no uniform doping within the bounds has');
  best = { log10: best.log10, score: scoreWithBestCurrent(problem, leg(best.log10), counter, warm) };
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
/** The scouting passes stop when no node temperature moves more than this [K]… */
const SCOUT_SETTLED = 1e-4;
/** …and the final pass must agree with them this well to call the leg self-consistent [K]. */
const LOCAL_ZT_SETTLED = 1e-3;

export function localBestZt(problem: DopingProblem, uniform: UniformBaseline, counter: Counter): LocalZtBaseline {
  const { family, lower, upper, conditions } = problem;
  const x = equallySpacedNodes(Math.max(problem.controlPoints, LOCAL_ZT_NODES));
  const hot = conditions.hotSide;
  const cold = uniform.score.coldSide;
  const scout = { ...problem, tolerance: Math.max(problem.tolerance, SCOUT_TOLERANCE) };
  // First guess of the temperature profile: the uniform leg's ends joined linearly.
  let temperatures = x.map((f) => cold + f * (hot - cold));
  const warm = newWarmStart(legFor(problem, x, x.map(() => uniform.log10)));
  // One pass: dope every node for the best zT at its temperature, optimise the
  // current, and read the node temperatures of the solved leg.
  const pass = (settings: DopingProblem) => {
    const log10 = temperatures.map((t) => ztOptimalLog10(family, t, lower, upper));
    const leg = legFor(problem, x, log10);
    const score = scoreWithBestCurrent(settings, leg, counter, warm);
    if (!score.feasible) return undefined;
    const solution = solveLegProblem({ leg, hotSide: hot, current: score.current, heatLoad: score.heatLoad }, { tolerance: settings.tolerance, estimateError: false, profilePoints: 2 });
    counter.evaluations++;
    const next = x.map((f) => {
      const at = f * problem.length;
      const k = solution.profile.x.findIndex((px) => Math.abs(px - at) <= 1e-12 * problem.length);
      return solution.profile.temperature[k];
    });
    const moved = Math.max(...next.map((t, k) => Math.abs(t - temperatures[k])));
    temperatures = next;
    return { log10, score, moved };
  };
  let passes = 0;
  let settled = false;
  for (; passes < LOCAL_ZT_PASSES && !settled; passes++) {
    const r = pass(scout);
    if (!r) throw noSteadyState(problem, 'the local-best-zT leg has no');
    settled = r.moved <= SCOUT_SETTLED;
  }
  // Final pass at the problem's accuracy: this is the leg reported.
  const final = pass(problem);
  if (!final) throw noSteadyState(problem, 'the local-best-zT leg has no');
  return { x, log10: final.log10, score: final.score, iterations: passes + 1, converged: settled && final.moved <= LOCAL_ZT_SETTLED };
}
