/**
 * Checked case in, result object out: solveLeg and optimizeLeg, the two
 * calls the CLI, the worker and the API make. Pure: no I/O; time is read
 * through an injectable clock only to report `seconds`.
 */
import { bestUniform, localBestZt, type LocalZtBaseline, type UniformBaseline } from './baselines';
import { CaseError } from './case-error';
import type { CheckedCase } from './check-case';
import type { Conditions, DesignScore, Objective } from './evaluate-design';
import { nodeFractions, type Counter, type DopingProblem } from './doping-problem';
import { gradedLeg, profileAt, segmentedLeg, withEnds, type Leg, type Segment } from './leg-profile';
import { optimizeDoping } from './optimize-doping';
import { bestSingleSegment, optimizeSegments } from './optimize-segments';
import { nodeSensitivities, type NodeSensitivity } from './sensitivity';
import { checkSolveOptions, solveLegProblem, type LegProfile, type LegSolution, type SolveOptions } from './solve-leg';

/** What `leg solve` prints. */
export type CaseSolution = Omit<LegSolution, 'shots' | 'evaluations'>;

/** A checkpoint: where an optimisation stands, to resume it with `start`. */
export type OptimizerState = { kind: 'doping'; perCm3: number[]; current: number } | { kind: 'segments'; fractions: number[]; current: number };

export type OptimizeProgress = {
  phase: 'uniform' | 'localBestZt' | 'profile' | 'fractions' | 'current';
  /** Iterations of the main optimisation so far (0 during the baselines). */
  iteration: number;
  /** Objective at the latest point: ΔT [K], heat load [W] or COP. */
  objective: number;
  /** Best objective so far. */
  best: number;
  /** Best design so far, resumable. */
  state: OptimizerState | null;
};

export type OptimizeOptions = {
  /** Called after each baseline and each iteration; the worker streams these. */
  onProgress?: (progress: OptimizeProgress) => void;
  /** Checked between iterations; true ends the run with the best design so far. */
  shouldStop?: () => boolean;
  /** Resume from a checkpoint (added as the first starting point). */
  start?: OptimizerState;
  /**
   * Relative accuracy of every solve.
   * @default 1e-9
   */
  tolerance?: number;
  /**
   * Milliseconds clock, for `seconds` only.
   * @default performance.now (Date.now where absent)
   */
  now?: () => number;
  /**
   * The baselines of this same case from `dopingBaselines`, so a multi-start
   * search computes them once instead of at every start.
   */
  baselines?: DopingBaselines | null;
  /** With `start`: search from it alone, not also from the baselines (later starts of a multi-start search). */
  startOnly?: boolean;
};

/** The two baselines of a doping-controlled case, reusable across optimisations of that case. */
export type DopingBaselines = { uniform: UniformBaseline; local: LocalZtBaseline; evaluations: number };

export type BaselineReport = {
  uniform: { perCm3: number; current: number; deltaT: number; objective: number };
  localBestZt: { current: number; deltaT: number; objective: number; doping: { x: number[]; perCm3: number[] }; passes: number; converged: boolean };
};

export type SegmentBaselineReport = { uniform: { segment: number; current: number; deltaT: number; objective: number }; localBestZt: null };

export type OptimizeResult = CaseSolution & {
  objective: { name: Objective; value: number };
  /** Optimised doping nodes: fractions of the length from the cold end, cm⁻³. */
  doping?: { x: number[]; perCm3: number[] };
  /** Optimised segments (fractions) for segmented legs. */
  segments?: Segment[];
  baselines: BaselineReport | SegmentBaselineReport | null;
  /** Per doping node: dΔT/dlog10 n, d²ΔT/dlog10 n² and the ±decades costing 1 K. */
  sensitivity: NodeSensitivity[];
  /** Leg solves spent. */
  evaluations: number;
  seconds: number;
  /** True when shouldStop ended the run early. */
  stopped: boolean;
  state: OptimizerState | null;
  /** Things a person should know about this optimum (e.g. it is pinned at a table's edge). */
  warnings: string[];
};

const defaultClock = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

function buildLeg(c: CheckedCase): Leg {
  if (c.leg.kind === 'segments') return withEnds(segmentedLeg(c.length, c.area, c.leg.segments), c.ends);
  const doping = c.leg.doping ?? { x: [0, 1], log10: [0, 0] };
  return withEnds(gradedLeg(c.length, c.area, c.leg.family, doping.x, doping.log10), c.ends);
}

function strip(s: LegSolution): CaseSolution {
  const { shots: _shots, evaluations: _evaluations, ...rest } = s;
  return rest;
}

/** Solve a checked case (mode 'solve'). */
export function solveLeg(c: CheckedCase, options: SolveOptions = {}): CaseSolution {
  if (c.current === undefined) throw new CaseError('current', 'is required for solve');
  const leg = buildLeg(c);
  return strip(solveLegProblem({ leg, hotSide: c.hotSide, current: c.current, heatLoad: c.heatLoad, coldSide: c.heatLoad === undefined ? c.coldSide : undefined }, options));
}

/**
 * A table family bounds the temperatures the optimiser may use; an optimum
 * touching that bound is the table's limit, not the leg's.
 */
function rangeWarnings(c: CheckedCase, solution: CaseSolution): string[] {
  if (c.leg.kind !== 'family' || c.leg.family.kind !== 'table') return [];
  const { minTemperature, maxTemperature } = c.leg.family;
  const temperatures = solution.profile.temperature;
  const warnings: string[] = [];
  if (Math.min(...temperatures) <= minTemperature + 1e-3) {
    warnings.push(`the optimum reaches the table's lowest temperature (${minTemperature} K): the leg could go colder than the measured range; extend the table to lower temperatures`);
  }
  if (Math.max(...temperatures) >= maxTemperature - 1e-3) {
    warnings.push(`the optimum reaches the table's highest temperature (${maxTemperature} K); extend the table to higher temperatures`);
  }
  return warnings;
}

function conditionsOf(c: CheckedCase): Conditions {
  return { objective: c.objective, hotSide: c.hotSide, heatLoad: c.heatLoad ?? 0, coldSide: c.coldSide };
}

/** The full solution of the winning design, solved for the objective's unknown. */
function finalSolution(c: CheckedCase, leg: Leg, score: DesignScore, tolerance: number): CaseSolution {
  const problem =
    c.objective === 'maxHeatLoad'
      ? { leg, hotSide: c.hotSide, current: score.current, coldSide: c.coldSide }
      : { leg, hotSide: c.hotSide, current: score.current, heatLoad: score.heatLoad };
  // An optimum pinned at a table's lowest temperature sits on the edge of
  // what the optimiser accepted; re-solving it from scratch may land a hair
  // beyond, so allow a relative sliver of 1e-7 (the spline's end cubic
  // extends smoothly there). The result then carries a warning.
  return strip(solveLegProblem(problem, { tolerance, rangeSlack: FINAL_RANGE_SLACK }));
}

const FINAL_RANGE_SLACK = 1e-7;

const baselineOf = (u: UniformBaseline, z: LocalZtBaseline): BaselineReport => ({
  uniform: { perCm3: Math.pow(10, u.log10), current: u.score.current, deltaT: u.score.deltaT, objective: u.score.value },
  localBestZt: {
    current: z.score.current,
    deltaT: z.score.deltaT,
    objective: z.score.value,
    doping: { x: z.x, perCm3: z.log10.map((v) => Math.pow(10, v)) },
    passes: z.iterations,
    converged: z.converged,
  },
});

/** Optimise a checked case (mode 'optimize'). */
export function optimizeLeg(c: CheckedCase, options: OptimizeOptions = {}): OptimizeResult {
  const now = options.now ?? defaultClock;
  const t0 = now();
  const { tolerance } = checkSolveOptions({ tolerance: options.tolerance });
  const seconds = () => (now() - t0) / 1000;
  const result = c.leg.kind === 'segments' || c.leg.material.kind === 'constant' ? optimizeSegmented(c, options, tolerance) : optimizeDoped(c, options, tolerance);
  return { ...result, seconds: seconds() };
}

const checkpoint = (log10: readonly number[], current: number): OptimizerState => ({ kind: 'doping', perCm3: log10.map((v) => Math.pow(10, v)), current });

/** Segments (or a constant material, one segment): fractions and/or current. */
function optimizeSegmented(c: CheckedCase, options: OptimizeOptions, tolerance: number): Omit<OptimizeResult, 'seconds'> {
  const material = c.leg.kind === 'family' && c.leg.material.kind === 'constant' ? c.leg.material : undefined;
  const segments: Segment[] = c.leg.kind === 'segments' ? c.leg.segments : [{ fraction: 1, seebeck: material?.seebeck ?? 0, sigma: material?.sigma ?? 1, kappa: material?.kappa ?? 1 }];
  const problem = {
    segments,
    length: c.length,
    area: c.area,
    conditions: conditionsOf(c),
    freeFractions: c.leg.kind === 'segments' && c.leg.freeFractions,
    current: c.current,
    tolerance,
    ends: c.ends,
  };
  if (options.start && options.start.kind !== 'segments') throw new CaseError('start', 'a doping checkpoint cannot resume a segmented leg');
  if (options.start && options.start.fractions.length !== segments.length) throw new CaseError('start.fractions', `needs one fraction per segment (${segments.length})`);
  const phase = problem.freeFractions ? 'fractions' : 'current';
  const opt = optimizeSegments(problem, {
    shouldStop: options.shouldStop,
    start: options.start?.kind === 'segments' ? options.start : undefined,
    onProgress: (p) => options.onProgress?.({ phase, iteration: p.iteration, objective: p.objective, best: p.best, state: { kind: 'segments', ...p.state } }),
  });
  if (!opt.score.feasible) throw new CaseError(c.objective === 'maxCop' ? 'heatLoad' : 'hotSide', 'no current gives a steady state for these conditions');
  const single = segments.length > 1 && c.leg.kind === 'segments' ? bestSingleSegment(problem) : undefined;
  const fitted = segments.map((s, k) => ({ ...s, fraction: opt.fractions[k] }));
  const solution = finalSolution(c, withEnds(segmentedLeg(c.length, c.area, fitted), c.ends), opt.score, tolerance);
  return {
    ...solution,
    objective: { name: c.objective, value: opt.score.value },
    ...(c.leg.kind === 'segments' ? { segments: fitted } : {}),
    baselines: single ? { uniform: { segment: single.segment, current: single.score.current, deltaT: single.score.deltaT, objective: single.score.value }, localBestZt: null } : null,
    sensitivity: [],
    evaluations: opt.evaluations + (single?.evaluations ?? 0) + 1,
    stopped: opt.stopped,
    state: { kind: 'segments', fractions: opt.fractions, current: opt.score.current },
    warnings: [],
  };
}

function dopingProblem(c: CheckedCase, tolerance: number): DopingProblem {
  if (c.leg.kind !== 'family') throw new Error('a doping problem needs a family leg');
  const leg = c.leg;
  const bounds = leg.bounds as { lower: number; upper: number };
  return {
    family: leg.family,
    length: c.length,
    area: c.area,
    conditions: conditionsOf(c),
    lower: bounds.lower,
    upper: bounds.upper,
    controlPoints: leg.controlPoints,
    monotone: leg.monotone,
    current: c.current,
    tolerance,
    ends: c.ends,
  };
}

function baselinesOf(problem: DopingProblem, counter: Counter): DopingBaselines {
  const before = counter.evaluations;
  const uniform = bestUniform(problem, counter);
  const local = localBestZt(problem, uniform, counter);
  return { uniform, local, evaluations: counter.evaluations - before };
}

/**
 * The best uniform leg and the local-best-zT leg of a doping-controlled case
 * (null for segments or a constant material), to pass to `optimizeLeg` as
 * `baselines` when the same case is optimised from many starts.
 */
export function dopingBaselines(c: CheckedCase, options: Pick<OptimizeOptions, 'tolerance'> = {}): DopingBaselines | null {
  if (c.leg.kind !== 'family' || c.leg.material.kind === 'constant' || !c.leg.bounds) return null;
  const { tolerance } = checkSolveOptions({ tolerance: options.tolerance });
  return baselinesOf(dopingProblem(c, tolerance), { evaluations: 0 });
}

/** A doping-controlled family: baselines, the node profile (and current), sensitivity. */
function optimizeDoped(c: CheckedCase, options: OptimizeOptions, tolerance: number): Omit<OptimizeResult, 'seconds'> {
  if (c.leg.kind !== 'family') throw new Error('optimizeDoped needs a family leg');
  const leg = c.leg;
  const problem = dopingProblem(c, tolerance);
  const clamp = (v: number) => Math.min(problem.upper, Math.max(problem.lower, v));
  const x = nodeFractions(problem);
  // Starting points besides the baselines: a checkpoint, else a doping given in the case.
  let start: { log10: number[]; current?: number } | undefined;
  if (options.start) {
    if (options.start.kind !== 'doping') throw new CaseError('start', 'a segment checkpoint cannot resume a doping optimisation');
    if (options.start.perCm3.length !== x.length) throw new CaseError('start.perCm3', `needs one doping per control point (${x.length})`);
    start = { log10: options.start.perCm3.map((v) => clamp(Math.log10(v))), current: options.start.current };
  } else if (leg.doping) {
    const given = leg.doping;
    start = { log10: x.map((f) => clamp(profileAt(given.x, given.log10, f))), current: c.current };
  }

  const counter: Counter = { evaluations: 0 };
  const { uniform, local } = options.baselines ?? baselinesOf(problem, counter);
  const flat = checkpoint(x.map(() => uniform.log10), uniform.score.current);
  options.onProgress?.({ phase: 'uniform', iteration: 0, objective: uniform.score.value, best: uniform.score.value, state: flat });
  options.onProgress?.({ phase: 'localBestZt', iteration: 0, objective: local.score.value, best: Math.max(local.score.value, uniform.score.value), state: flat });

  const opt = optimizeDoping(problem, uniform, local, counter, {
    start: start && { log10: start.log10, current: start.current ?? uniform.score.current },
    startOnly: options.startOnly === true && start !== undefined,
    shouldStop: options.shouldStop,
    onProgress: (p) => options.onProgress?.({ phase: 'profile', iteration: p.iteration, objective: p.objective, best: p.best, state: checkpoint(p.state.log10, p.state.current) }),
  });
  const build = (log10: readonly number[]) => withEnds(gradedLeg(c.length, c.area, leg.family, x, log10), c.ends);
  const solution = finalSolution(c, build(opt.log10), opt.score, tolerance);
  const sensitivity = nodeSensitivities({
    x,
    log10: opt.log10,
    current: solution.current,
    heatLoad: solution.heatLoad,
    hotSide: c.hotSide,
    build,
    minLog10: leg.family.minLog10Doping,
    maxLog10: leg.family.maxLog10Doping,
    tolerance,
  });
  return {
    ...solution,
    objective: { name: c.objective, value: opt.score.value },
    doping: { x, perCm3: opt.log10.map((v) => Math.pow(10, v)) },
    baselines: baselineOf(uniform, local),
    sensitivity: sensitivity.nodes,
    evaluations: counter.evaluations + sensitivity.evaluations + 1,
    stopped: opt.stopped,
    state: checkpoint(opt.log10, opt.score.current),
    warnings: rangeWarnings(c, solution),
  };
}

export type { LegProfile };
