/**
 * The matched couple optimised as one design: each optimised leg's node
 * dopings (log10, piecewise linear, within its own bounds, monotone if
 * asked — the parametrisations of optimize-doping.ts), the shared current
 * and the area ratio A_n / A_p (as ln r, boxed to 0.1–10, the total leg
 * area held fixed), by the box quasi-Newton method (box-bfgs.ts) with
 * forward-difference gradients. Joint, because the best ratio depends on
 * the profiles (through ρ and κ) and the best profiles on the current each
 * leg is given, which the ratio sets.
 */
import { bestUniform } from './baselines';
import { minimizeBox } from './box-bfgs';
import { CaseError } from './case-error';
import { AREA_RATIO_BOUNDS, type CheckedCoupleCase, type CoupleLegCase } from './couple-case';
import { legsSolver, scoreCouple, type CoupleConditions, type CoupleScore, type SolveCounter } from './couple-score';
import type { DopingProblem } from './doping-problem';
import type { Conditions } from './evaluate-design';
import { equallySpacedNodes, profileAt, type Leg } from './leg-profile';
import { brentMinimize } from './minimize-scalar';
import { legFromDefinition } from './module';
import { freeParametrisation, monotoneParametrisation, type Parametrisation } from './optimize-doping';
import { legAverages } from './shoot';

/** A resumable couple design: node dopings (log10 cm⁻³; null for a fixed leg), current [A], A_n / A_p. */
export type CoupleState = { p: number[] | null; n: number[] | null; current: number; areaRatio: number };

export type CoupleProgress = { iteration: number; objective: number; best: number; state: CoupleState };

export type CoupleRunOptions = {
  onProgress?: (p: CoupleProgress) => void;
  shouldStop?: () => boolean;
  /** An extra starting design (a checkpoint, or a search's random start). */
  start?: CoupleState;
  /** Search from `start` alone (later starts of a multi-start search). */
  startOnly?: boolean;
  /** @default 1e-9 */
  tolerance?: number;
};

export type CoupleOptimum = {
  state: CoupleState;
  p: Leg;
  n: Leg;
  score: CoupleScore;
  /** Node fractions of each optimised leg (null for a fixed one). */
  x: { p: number[] | null; n: number[] | null };
  iterations: number;
  stopped: boolean;
};

export function coupleConditions(c: CheckedCoupleCase): CoupleConditions {
  return { objective: c.objective, hotSide: c.hotSide, heatLoad: c.heatLoad ?? 0, ...(c.coldSide !== undefined ? { coldSide: c.coldSide } : {}) };
}

/** Whether the area ratio is a variable: it is unless given. */
export const ratioIsFree = (c: CheckedCoupleCase) => c.areaRatio === undefined;
/** Whether the current is a variable (maxCop's is set by the conditions). */
export const coupleCurrentIsFree = (c: CheckedCoupleCase) => c.current === undefined && c.objective !== 'maxCop';

/** Leg cross-sections at a ratio: the given areas when it is fixed, else the total split. */
export function areasAt(c: CheckedCoupleCase, ratio: number): { p: number; n: number } {
  if (!ratioIsFree(c)) return { p: c.p.area, n: c.n.area };
  const total = c.p.area + c.n.area;
  return { p: total / (1 + ratio), n: (total * ratio) / (1 + ratio) };
}

/** One leg at an area and (for an optimised leg) a node profile. */
export function coupleLeg(l: CoupleLegCase, area: number, log10: readonly number[] | null): Leg {
  if (l.profile && log10) {
    const x = equallySpacedNodes(l.profile.controlPoints);
    return legFromDefinition({ length: l.length, area, leg: { kind: 'family', family: l.profile.family, doping: { x, log10: [...log10] } }, ...(l.ends ? { ends: l.ends } : {}) });
  }
  return legFromDefinition({ length: l.length, area, leg: l.leg, ...(l.ends ? { ends: l.ends } : {}) });
}

/** A leg's share of the couple's conditions: the heat load in proportion to its area. */
function legConditions(conditions: CoupleConditions, share: number): Conditions {
  // maxCop's per-leg COP problem may have no solution at all; its uniform start is taken at the largest heat load instead.
  const objective = conditions.objective === 'maxCop' ? 'maxHeatLoad' : conditions.objective;
  return { objective, hotSide: conditions.hotSide, heatLoad: objective === 'maxHeatLoad' ? 0 : conditions.heatLoad * share, ...(conditions.coldSide !== undefined ? { coldSide: conditions.coldSide } : {}) };
}

/** The leg's starting profile: its given doping, else its best uniform doping alone (the existing baseline), else mid-bounds. */
function startProfile(l: CoupleLegCase, area: number, share: number, conditions: CoupleConditions, tolerance: number, counter: SolveCounter): number[] | null {
  const profile = l.profile;
  if (!profile) return null;
  const x = equallySpacedNodes(profile.controlPoints);
  const clamp = (v: number) => Math.min(profile.upper, Math.max(profile.lower, v));
  if (profile.start) {
    const given = profile.start;
    return x.map((f) => clamp(profileAt(given.x, given.log10, f)));
  }
  const problem: DopingProblem = {
    family: profile.family,
    length: l.length,
    area,
    conditions: legConditions(conditions, share),
    lower: profile.lower,
    upper: profile.upper,
    controlPoints: profile.controlPoints,
    monotone: profile.monotone,
    tolerance,
    ...(l.ends ? { ends: l.ends } : {}),
  };
  try {
    const u = bestUniform(problem, counter);
    return x.map(() => u.log10);
  } catch (e) {
    if (!(e instanceof CaseError)) throw e;
    return x.map(() => 0.5 * (profile.lower + profile.upper));
  }
}

/**
 * The constant-property matched ratio: R·K = (ρp·Lp/Ap + ρn·Ln/An)(κp·Ap/Lp + κn·An/Ln)
 * is least at (An/Ln)/(Ap/Lp) = √(ρn·κp/(ρp·κn)), properties averaged at T̄.
 */
export function matchedRatio(p: Leg, n: Leg, temperature: number): number {
  const a = legAverages(p, temperature);
  const b = legAverages(n, temperature);
  return (n.length / p.length) * Math.sqrt((b.resistivity * a.kappa) / (a.resistivity * b.kappa));
}

const clampRatio = (r: number) => Math.min(AREA_RATIO_BOUNDS.upper, Math.max(AREA_RATIO_BOUNDS.lower, r));

/** The best current for a design, by Brent on [0, 3·I_ref] widened while the peak sits at the edge. */
function bestCurrent(p: Leg, n: Leg, conditions: CoupleConditions, tolerance: number, counter: SolveCounter): CoupleScore | undefined {
  const reference = legsSolver([p, n], tolerance).referenceCurrent(conditions.hotSide);
  let best: CoupleScore | undefined;
  const f = (i: number) => {
    const s = scoreCouple(p, n, i, conditions, tolerance, counter);
    if (s.feasible && (!best || s.value > best.value)) best = s;
    return s.feasible ? -s.value : Number.MAX_VALUE;
  };
  let upper = 3 * reference;
  let m = brentMinimize(f, 0, upper, 1e-6 * reference);
  while (best && m.x > 0.97 * upper && upper < 1e3 * reference) {
    upper *= 3;
    m = brentMinimize(f, 0.5 * m.x, upper, 1e-6 * reference);
  }
  return best;
}

/** The engine's own start: each leg's best uniform doping, the matched ratio at T̄, the best current there. */
function ownStart(c: CheckedCoupleCase, conditions: CoupleConditions, tolerance: number, counter: SolveCounter): CoupleState {
  const ratio0 = ratioIsFree(c) ? c.n.area / c.p.area : (c.areaRatio ?? c.n.area / c.p.area);
  const areas0 = areasAt(c, ratio0);
  const total = areas0.p + areas0.n;
  const pLog = startProfile(c.p, areas0.p, areas0.p / total, conditions, tolerance, counter);
  const nLog = startProfile(c.n, areas0.n, areas0.n / total, conditions, tolerance, counter);
  let ratio = ratio0;
  const p0 = coupleLeg(c.p, areas0.p, pLog);
  const n0 = coupleLeg(c.n, areas0.n, nLog);
  if (ratioIsFree(c)) {
    // T̄: the mean of the junctions; for maxDeltaT, Tc guessed from the couple's Z at the starting ratio (Ioffe).
    const tc = c.coldSide ?? guessColdSide(p0, n0, c.hotSide);
    ratio = clampRatio(matchedRatio(p0, n0, 0.5 * (tc + c.hotSide)));
  }
  const areas = areasAt(c, ratio);
  const p = coupleLeg(c.p, areas.p, pLog);
  const n = coupleLeg(c.n, areas.n, nLog);
  const current = c.current ?? (coupleCurrentIsFree(c) ? bestCurrent(p, n, conditions, tolerance, counter)?.current : undefined) ?? legsSolver([p, n], tolerance).referenceCurrent(c.hotSide);
  return { p: pLog, n: nLog, current, areaRatio: ratio };
}

/** Tc = (√(1 + 2Z·Th) − 1)/Z of the couple's averaged legs at Th. */
function guessColdSide(p: Leg, n: Leg, hotSide: number): number {
  const a = legAverages(p, hotSide);
  const b = legAverages(n, hotSide);
  const s = Math.abs(a.seebeck) + Math.abs(b.seebeck);
  const r = (a.resistivity * p.length) / p.area + (b.resistivity * n.length) / n.area;
  const k = (a.kappa * p.area) / p.length + (b.kappa * n.area) / n.length;
  const z = (s * s) / (r * k);
  return z > 0 ? (Math.sqrt(1 + 2 * z * hotSide) - 1) / z : hotSide;
}

/** Both directions of a monotone leg are tried; a free or fixed leg has one parametrisation. */
function parametrisationsOf(l: CoupleLegCase): (Parametrisation | null)[] {
  const profile = l.profile;
  if (!profile) return [null];
  const n = profile.controlPoints;
  return profile.monotone ? [monotoneParametrisation(n, profile.lower, profile.upper, false), monotoneParametrisation(n, profile.lower, profile.upper, true)] : [freeParametrisation(n, profile.lower, profile.upper)];
}

export function optimizeCouple(c: CheckedCoupleCase, counter: SolveCounter, options: CoupleRunOptions = {}): CoupleOptimum {
  const tolerance = options.tolerance ?? 1e-9;
  const conditions = coupleConditions(c);
  const freeCurrent = coupleCurrentIsFree(c);
  const freeRatio = ratioIsFree(c);
  const starts: CoupleState[] = options.start && options.startOnly ? [options.start] : [...(options.start ? [options.start] : []), ownStart(c, conditions, tolerance, counter)];
  const x = { p: c.p.profile ? equallySpacedNodes(c.p.profile.controlPoints) : null, n: c.n.profile ? equallySpacedNodes(c.n.profile.controlPoints) : null };
  const build = (s: CoupleState) => {
    const areas = areasAt(c, s.areaRatio);
    return { p: coupleLeg(c.p, areas.p, s.p), n: coupleLeg(c.n, areas.n, s.n) };
  };
  const reference = (() => {
    const legs = build(starts[starts.length - 1]);
    return legsSolver([legs.p, legs.n], tolerance).referenceCurrent(c.hotSide);
  })();
  const shared = (() => {
    const legs = build(starts[starts.length - 1]);
    return legsSolver([legs.p, legs.n], tolerance);
  })();
  let best: CoupleOptimum | undefined;
  let iterations = 0;
  let lastCurrent: number | undefined;
  const consider = (state: CoupleState, legs: { p: Leg; n: Leg }, score: CoupleScore) => {
    if (!best || (score.feasible && (!best.score.feasible || score.value > best.score.value)) || (!best.score.feasible && score.value > best.score.value)) {
      best = { state, p: legs.p, n: legs.n, score, x, iterations, stopped: false };
    }
  };
  const done = (stopped: boolean): CoupleOptimum => {
    if (!best) throw new CaseError(c.objective === 'maxCop' ? 'heatLoad' : 'hotSide', 'no design of this couple has a steady state for these conditions');
    return { ...best, iterations, stopped };
  };

  const combos: [Parametrisation | null, Parametrisation | null][] = parametrisationsOf(c.p).flatMap((pp) => parametrisationsOf(c.n).map((pn): [Parametrisation | null, Parametrisation | null] => [pp, pn]));
  for (const [pp, pn] of combos) {
    const np = pp ? pp.lower.length : 0;
    const nn = pn ? pn.lower.length : 0;
    const stateOf = (v: readonly number[]): CoupleState => ({
      p: pp ? pp.toProfile(v.slice(0, np)) : null,
      n: pn ? pn.toProfile(v.slice(np, np + nn)) : null,
      current: freeCurrent ? v[np + nn] * reference : (c.current ?? 0),
      areaRatio: freeRatio ? Math.exp(v[np + nn + (freeCurrent ? 1 : 0)]) : (c.areaRatio ?? c.n.area / c.p.area),
    });
    const lower = [...(pp?.lower ?? []), ...(pn?.lower ?? []), ...(freeCurrent ? [1e-3] : []), ...(freeRatio ? [Math.log(AREA_RATIO_BOUNDS.lower)] : [])];
    const upper = [...(pp?.upper ?? []), ...(pn?.upper ?? []), ...(freeCurrent ? [50] : []), ...(freeRatio ? [Math.log(AREA_RATIO_BOUNDS.upper)] : [])];
    let scale = 0;
    const f = (v: readonly number[]) => {
      const state = stateOf(v);
      const legs = build(state);
      const score = scoreCouple(legs.p, legs.n, state.current, conditions, tolerance, counter, lastCurrent, shared);
      if (score.feasible && c.objective === 'maxCop') lastCurrent = score.current;
      consider({ ...state, current: score.current }, legs, score);
      if (scale === 0) scale = Math.max(Math.abs(score.value), 1e-30);
      return score.feasible ? -score.value / scale : score.value === -Infinity ? Infinity : 1 - score.value;
    };
    for (const start of starts) {
      if (options.shouldStop?.()) return done(true);
      const v0 = [
        ...(pp && start.p ? pp.fromProfile(start.p) : []),
        ...(pn && start.n ? pn.fromProfile(start.n) : []),
        ...(freeCurrent ? [Math.min(50, Math.max(1e-3, start.current / reference))] : []),
        ...(freeRatio ? [Math.log(clampRatio(start.areaRatio))] : []),
      ];
      if (v0.length !== lower.length) continue;
      scale = 0;
      if (v0.length === 0) {
        f(v0);
        continue;
      }
      const result = minimizeBox(f, v0, {
        lower,
        upper,
        steps: lower.map(() => 1e-5),
        gradientTolerance: 1e-6,
        valueTolerance: 1e-11,
        initialStep: 0.1,
        maxIterations: 300,
        shouldStop: options.shouldStop,
        onIteration: (_it, v, value) => {
          iterations++;
          const b = best as CoupleOptimum;
          options.onProgress?.({ iteration: iterations, objective: -value * scale, best: b.score.value, state: b.state });
        },
      });
      if (result.reason === 'stopped') return done(true);
    }
  }
  return done(false);
}
