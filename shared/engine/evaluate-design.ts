/**
 * One design (a leg and a current) scored for an objective — the function
 * every optimiser maximises. Each call is one shooting solve (or, for
 * maxCop, one search for the current); warm starts carry the previous root
 * and slope so neighbouring designs (finite differences, line searches)
 * cost one or two integrations.
 */
import { brentMinimize } from './minimize-scalar';
import { secantThenBrent } from './find-root';
import { integrateLeg } from './integrate';
import { contactSum } from './leg-ends';
import type { Leg } from './leg-profile';
import { legAverages, legFluxScale, shootColdSide, shootHeatLoad } from './shoot';
import { odeToleranceFor } from './solve-leg';

export type Objective = 'maxDeltaT' | 'maxHeatLoad' | 'maxCop';

export type Conditions = {
  objective: Objective;
  hotSide: number;
  /** Heat load [W]: given for maxDeltaT (0 by default) and maxCop. */
  heatLoad: number;
  /** Cold side [K]: given for maxHeatLoad and maxCop. */
  coldSide?: number;
};

export type DesignScore = {
  feasible: boolean;
  /** The objective (larger is better): ΔT [K], heat load [W] or COP; −∞… when infeasible. */
  value: number;
  current: number;
  coldSide: number;
  heatLoad: number;
  deltaT: number;
  cop: number | null;
};

/** Carried between calls on neighbouring designs. */
export type WarmStart = { guess?: number; slope?: number; current?: number; stepHint: { step: number } };

export function newWarmStart(leg: Leg): WarmStart {
  return { stepHint: { step: leg.length / 16 } };
}

/** Reference current S̄·Th/R̄ of the leg's averaged properties, contacts included (the uniform leg's optimum is near it). */
export function referenceCurrent(leg: Leg, hotSide: number): number {
  const avg = legAverages(leg, hotSide);
  const resistance = (avg.resistivity * leg.length + contactSum(leg.ends)) / leg.area;
  return Math.abs(avg.seebeck * hotSide) / resistance;
}

const INFEASIBLE: Omit<DesignScore, 'current'> = { feasible: false, value: -Infinity, coldSide: NaN, heatLoad: NaN, deltaT: NaN, cop: null };

export function scoreDesign(leg: Leg, current: number, conditions: Conditions, warm: WarmStart, tolerance: number): DesignScore {
  if (conditions.objective === 'maxCop') return scoreCop(leg, conditions, warm, tolerance);
  const { hotSide } = conditions;
  const J = (leg.sign * current) / leg.area;
  const settings = { tolerance, odeTolerance: odeToleranceFor(tolerance), stepHint: warm.stepHint, guess: warm.guess, slope: warm.slope };
  if (conditions.objective === 'maxHeatLoad') {
    const coldSide = conditions.coldSide as number;
    const out = shootHeatLoad(leg, J, hotSide, coldSide, settings);
    if (!out.ok || !out.shot.converged) return { ...INFEASIBLE, current };
    warm.guess = out.shot.coldFlux;
    warm.slope = out.shot.slope;
    const heatLoad = out.shot.coldFlux * leg.area;
    const power = (out.shot.hotFlux - out.shot.coldFlux - out.shot.parasitic) * leg.area;
    return { feasible: true, value: heatLoad, current, coldSide, heatLoad, deltaT: hotSide - coldSide, cop: power > 0 ? heatLoad / power : null };
  }
  const out = shootColdSide(leg, J, hotSide, conditions.heatLoad / leg.area, settings);
  if (!out.ok || !out.shot.converged) return { ...INFEASIBLE, current };
  warm.guess = out.shot.coldSide;
  warm.slope = out.shot.slope;
  const power = (out.shot.hotFlux - out.shot.coldFlux - out.shot.parasitic) * leg.area;
  const deltaT = hotSide - out.shot.coldSide;
  return { feasible: true, value: deltaT, current, coldSide: out.shot.coldSide, heatLoad: conditions.heatLoad, deltaT, cop: power > 0 ? conditions.heatLoad / power : null };
}

/**
 * maxCop: Tc, Th and Qc are all given, so the current is not free — it is the
 * smaller root of T(L; I) = Th (the larger root only adds Joule heat: with
 * Qc fixed, P = Qh − Qc grows with I). When even the best current cannot
 * reach Th the design is infeasible and scores the (negative) shortfall, so
 * an optimiser is still pulled towards feasibility.
 */
function scoreCop(leg: Leg, conditions: Conditions, warm: WarmStart, tolerance: number): DesignScore {
  const { hotSide, heatLoad } = conditions;
  const coldSide = conditions.coldSide as number;
  const q0 = heatLoad / leg.area;
  const reference = referenceCurrent(leg, hotSide);
  const fine = odeToleranceFor(tolerance);
  const fluxScale = legFluxScale(leg, hotSide, (leg.sign * reference) / leg.area);
  const hotEnd = (current: number, odeTolerance: number) =>
    integrateLeg(leg, (leg.sign * current) / leg.area, coldSide, q0, { tolerance: odeTolerance, fluxScale, stepHint: warm.stepHint });
  const hotTemperature = (current: number) => {
    const r = hotEnd(current, 1e-6);
    return r.status === 'ok' ? r.temperature : r.status === 'high' ? Infinity : -Infinity;
  };
  // The current that lifts heat to the highest hot-end temperature (coarse is enough: it only bounds the root).
  let upper = 3 * reference;
  let peak = brentMinimize((i) => -hotTemperature(i), 0, upper, 1e-4 * reference);
  while (peak.x > 0.98 * upper && upper < 1e3 * reference) {
    upper *= 3;
    peak = brentMinimize((i) => -hotTemperature(i), 0, upper, 1e-4 * reference);
  }
  const reach = -peak.value;
  if (!(reach >= hotSide)) {
    const shortfall = Number.isFinite(reach) ? (hotSide - reach) / hotSide : 1;
    return { ...INFEASIBLE, value: -shortfall, current: peak.x };
  }
  const gap = (i: number) => {
    const r = hotEnd(i, fine);
    return r.status === 'ok' ? r.temperature - hotSide : r.status === 'high' ? Infinity : -Infinity;
  };
  const guess = warm.current !== undefined && warm.current < peak.x ? warm.current : 0.5 * peak.x;
  const root = secantThenBrent(gap, guess, Math.max(1e-12, (reach - coldSide) / Math.max(peak.x, 1e-30)), 0, peak.x, tolerance * reference);
  const current = root.root;
  warm.current = current;
  const end = hotEnd(current, fine);
  if (end.status !== 'ok') return { ...INFEASIBLE, current };
  const power = (end.flux - q0 - end.parasitic) * leg.area;
  const cop = power > 0 ? heatLoad / power : null;
  return { feasible: true, value: cop ?? 0, current, coldSide, heatLoad, deltaT: hotSide - coldSide, cop };
}

/** A design perturbed in one variable, for implicitGradient. */
export type DesignPoint = { leg: Leg; current: number };

/**
 * d(objective)/d(variable) for maxDeltaT and maxHeatLoad by implicit
 * differentiation of the shooting condition g(root, v) = T(L) − Th = 0:
 * d root/dv = −(∂g/∂v)/(∂g/∂root). Both partials are finite differences of
 * one integration each, all replaying the step sequence of one adaptive
 * integration at the base root — so a gradient costs n + 2 integrations
 * instead of n shooting solves, and is free of step-selection noise.
 * Returns undefined for maxCop (whose current is itself a root) or when an
 * integration leaves the material's range; callers then fall back to plain
 * finite differences.
 */
export function implicitGradient(
  base: DesignPoint,
  root: number,
  conditions: Conditions,
  tolerance: number,
  perturbed: (i: number) => { point: DesignPoint; step: number },
  count: number,
): number[] | undefined {
  if (conditions.objective === 'maxCop') return undefined;
  const { leg } = base;
  const unknownIsCold = conditions.objective === 'maxDeltaT';
  const q0 = conditions.heatLoad / leg.area;
  const tc = conditions.coldSide as number;
  const density = (p: DesignPoint) => (p.leg.sign * p.current) / p.leg.area;
  const fluxScale = legFluxScale(leg, conditions.hotSide, density(base));
  const odeTolerance = odeToleranceFor(tolerance);
  const steps: number[] = [];
  const at = (p: DesignPoint, value: number, replay?: readonly number[]) =>
    integrateLeg(p.leg, density(p), unknownIsCold ? value : tc, unknownIsCold ? q0 : value, { tolerance: odeTolerance, fluxScale, record: replay ? undefined : steps, replay });
  const reference = at(base, root);
  if (reference.status !== 'ok') return undefined;
  const delta = unknownIsCold ? 1e-4 * root : 1e-6 * fluxScale;
  const shifted = at(base, root + delta, steps);
  if (shifted.status !== 'ok') return undefined;
  const slope = (shifted.temperature - reference.temperature) / delta;
  if (!(slope !== 0 && Number.isFinite(slope))) return undefined;
  const gradient: number[] = [];
  for (let i = 0; i < count; i++) {
    const { point, step } = perturbed(i);
    const r = at(point, root, steps);
    if (r.status !== 'ok') return undefined;
    const dRoot = -(r.temperature - reference.temperature) / step / slope;
    // ΔT = Th − Tc falls as Tc rises; the heat load is the root times the area.
    gradient.push(unknownIsCold ? -dRoot : dRoot * leg.area);
  }
  return gradient;
}
