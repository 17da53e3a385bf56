/**
 * Operating curves of a device (leg, couple or module) with the load and the
 * sink at fixed temperatures: Qc, Qh, V, P = V·I and COP versus the current.
 *
 * - Current of maximum Qc: Brent's minimiser on −Qc(I) over [0, 2·I_ref]
 *   (widened while the optimum sits at the edge); Qc(I) is single-peaked
 *   (Peltier cooling grows like I, Joule heat like I²).
 * - If that maximum is below 0 the device cannot hold the ΔT at any current.
 * - Pumping range: the two roots of Qc(I) = 0 on either side of that peak,
 *   by Brent's root finder (at ΔT = 0 the lower end is I = 0).
 * - Current of maximum COP: Brent's minimiser on −COP(I) over
 *   [I_min, I_maxQc]. COP is 0 at I_min, positive inside, and falling at
 *   I_maxQc (dQc/dI = 0 there while P grows), so its single peak lies inside.
 *   At ΔT = 0 the COP grows without bound as I → 0: no maximum.
 * - Samples: `points` currents equally spaced over the pumping range, for
 *   plots only; the marked currents come from the optimiser.
 */
import { CaseError } from './case-error';
import type { DevicePoint, DeviceSolver } from './device';
import { brentRoot } from './find-root';
import { CURRENT_TOLERANCE, MAX_WIDENING, maxDeltaTPoint, maxHeatLoadPoint } from './device-optima';
import { brentMinimize } from './minimize-scalar';

/** One point of a curve; overLimit when a current limit was given and I exceeds it. */
export type OperatingPoint = DevicePoint & { overLimit: boolean };

export type CurveConditions = {
  /** Heat-sink temperature [K] (the hot junction's without plates). */
  hotSide: number;
  /** Load temperature [K] (the cold junction's without plates); give this or deltaT. */
  coldSide?: number;
  /** hotSide − coldSide [K], ≥ 0; give this or coldSide. */
  deltaT?: number;
};

export type CurveOptions = {
  /**
   * Sampled currents over the pumping range (plots only).
   * @default 40
   */
  points?: number;
  /** Supply or wire limit [A]: points above it are flagged. */
  currentLimit?: number;
  /**
   * Relative accuracy of every leg solve.
   * @default 1e-9
   */
  tolerance?: number;
};

/** A device sampled along a curve: the current [A] at each sample and the device there (W, V, W, –). */
export type CurveSamples = {
  currents: number[];
  heatLoad: number[];
  heatRejected: number[];
  voltage: number[];
  power: number[];
  cop: (number | null)[];
  /** Per sample: the current exceeds currentLimit (all false without a limit). */
  overLimit: boolean[];
  currentLimit: number | null;
};

export type OperatingCurve = CurveSamples & {
  hotSide: number;
  coldSide: number;
  deltaT: number;
  /** [I_min, I_max] [A]: the currents at which the device pumps heat (Qc ≥ 0) at this ΔT. */
  pumpingRange: [number, number];
  /** Junction temperatures [K] at the samples; only when a plate resistance is set. */
  coldJunction?: number[];
  hotJunction?: number[];
  /** The current of maximum Qc and the device there. */
  maxHeatLoad: OperatingPoint;
  /** The current of maximum COP and the device there; null at ΔT = 0 (no maximum). */
  maxCop: OperatingPoint | null;
  warnings: string[];
  /** Leg solves spent. */
  evaluations: number;
};

/** Relative precision of the pumping-range ends (Qc crosses 0 steeply there). */
const ROOT_TOLERANCE = 1e-9;

export const DEFAULT_CURVE_POINTS = 40;

export type CheckedConditions = { hotSide: number; coldSide: number; deltaT: number; field: 'coldSide' | 'deltaT' };

/** Exactly one of coldSide and deltaT, and a cold side at or below the hot side. */
export function checkConditions(conditions: CurveConditions): CheckedConditions {
  const { hotSide } = conditions;
  if (!(Number.isFinite(hotSide) && hotSide > 0)) throw new CaseError('hotSide', 'must be a temperature in kelvin, greater than 0');
  if ((conditions.coldSide === undefined) === (conditions.deltaT === undefined)) throw new CaseError('deltaT', 'give either deltaT or coldSide, not both and not neither');
  if (conditions.deltaT !== undefined) {
    const deltaT = conditions.deltaT;
    if (!(Number.isFinite(deltaT) && deltaT >= 0)) throw new CaseError('deltaT', 'must be 0 or more (kelvin): the curves are for cooling, the load at or below the sink');
    if (!(deltaT < hotSide)) throw new CaseError('deltaT', `must be below hotSide (${hotSide} K)`);
    return { hotSide, coldSide: hotSide - deltaT, deltaT, field: 'deltaT' };
  }
  const coldSide = conditions.coldSide as number;
  if (!(Number.isFinite(coldSide) && coldSide > 0)) throw new CaseError('coldSide', 'must be a temperature in kelvin, greater than 0');
  if (coldSide > hotSide) throw new CaseError('coldSide', `must not be above hotSide (${hotSide} K): the curves are for cooling`);
  return { hotSide, coldSide, deltaT: hotSide - coldSide, field: 'coldSide' };
}

export function checkCurveOptions(options: CurveOptions): { points: number; currentLimit: number | null; tolerance: number } {
  const points = options.points ?? DEFAULT_CURVE_POINTS;
  if (!Number.isInteger(points) || points < 2 || points > 1000) throw new CaseError('points', 'must be a whole number from 2 to 1000');
  const limit = options.currentLimit;
  if (limit !== undefined && !(Number.isFinite(limit) && limit > 0)) throw new CaseError('currentLimit', 'must be a current in amperes, greater than 0');
  const tolerance = options.tolerance ?? 1e-9;
  if (!(tolerance >= 1e-13 && tolerance <= 1e-3)) throw new CaseError('tolerance', 'must be between 1e-13 and 1e-3');
  return { points, currentLimit: limit ?? null, tolerance };
}

export const flagged = (p: DevicePoint, limit: number | null): OperatingPoint => ({ ...p, overLimit: limit !== null && p.current > limit });

/** The operating summary without samples: pumping range, maximum Qc, maximum COP. */
export type OperatingSummary = { pumpingRange: [number, number]; maxHeatLoad: DevicePoint; maxCop: DevicePoint | null; warnings: string[] };

export function operatingSummary(solver: DeviceSolver, c: CheckedConditions, what: string): OperatingSummary {
  const { hotSide, coldSide, deltaT } = c;
  const reference = solver.referenceCurrent(hotSide);
  const warnings: string[] = [];
  const top = maxHeatLoadPoint(solver, hotSide, coldSide);
  if (!top) throw new CaseError(c.field, `no current gives ${what} a steady state at ΔT = ${fmt(deltaT)} K (Tc = ${fmt(coldSide)} K, Th = ${fmt(hotSide)} K)`);
  if (top.heatLoad < 0) {
    const most = maxDeltaTPoint(solver, hotSide);
    const limit = most ? ` (the most it holds with no load is ΔT = ${(hotSide - most.coldSide).toFixed(2)} K, at ${fmt(most.current)} A)` : '';
    throw new CaseError(
      c.field,
      `${what} cannot hold ΔT = ${fmt(deltaT)} K (Tc = ${fmt(coldSide)} K, Th = ${fmt(hotSide)} K) at any current: at its best current, ${fmt(top.current)} A, ${fmt(-top.heatLoad)} W would still leak into the load${limit}; lower the ΔT`,
    );
  }
  const qc = (current: number) => solver.at(current, hotSide, { coldSide })?.heatLoad ?? NaN;
  // Lower end: Qc(0) = −K·ΔT < 0 (0 at ΔT = 0, where the range starts at I = 0).
  let lower = 0;
  if (deltaT > 0) {
    const q0 = qc(0);
    lower = q0 < 0 && top.heatLoad > 0 ? brentRoot(qc, 0, top.current, q0, top.heatLoad, ROOT_TOLERANCE * reference).root : q0 >= 0 ? 0 : top.current;
  }
  // Upper end: probe where a parabola through the peak (zero slope there)
  // and the last probe puts the root — exact for constant properties, where
  // Qc(I) is a parabola — and a little beyond it, until Qc < 0. Probing no
  // further than that keeps clear of currents without a steady state (a
  // lightly doped hot end can run away thermally), which are costly to try.
  // If one is hit anyway it is bisected against the last good current:
  // either Qc turns negative first (the root is bracketed) or the range is
  // cut at that edge.
  let a = top.current;
  let qa = top.heatLoad;
  let b = top.current + Math.max(top.current - lower, 0.25 * reference);
  let qb = qc(b);
  while (qb >= 0 && b < MAX_WIDENING * reference) {
    const drop = top.heatLoad - qb;
    const reach = drop > 0 ? (b - top.current) * Math.sqrt(top.heatLoad / drop) : 2 * (b - top.current);
    a = b;
    qa = qb;
    b = top.current + Math.max(1.02 * reach, 1.1 * (b - top.current));
    qb = qc(b);
  }
  for (let k = 0; Number.isNaN(qb) && k < 60 && b - a > ROOT_TOLERANCE * reference; k++) {
    const m = 0.5 * (a + b);
    const qm = qc(m);
    if (qm >= 0) {
      a = m;
      qa = qm;
    } else {
      b = m;
      qb = qm;
    }
  }
  let upper: number;
  if (qb < 0) upper = qa > 0 ? brentRoot(qc, a, b, qa, qb, ROOT_TOLERANCE * reference).root : a;
  else {
    upper = a;
    warnings.push(`above ${fmt(upper)} A ${what} has no steady state (thermal runaway, or beyond its materials' temperature range), so the pumping range is cut there`);
  }
  let maxCop: DevicePoint | null = null;
  if (deltaT > 0) {
    let best: DevicePoint | undefined;
    const negative = (current: number) => {
      const p = solver.at(current, hotSide, { coldSide });
      if (p && p.cop !== null && (!best || best.cop === null || p.cop > best.cop)) best = p;
      return p && p.cop !== null ? -p.cop : Number.MAX_VALUE;
    };
    brentMinimize(negative, lower, top.current, CURRENT_TOLERANCE * reference);
    maxCop = best ?? null;
  } else {
    warnings.push('at ΔT = 0 the COP grows without bound as the current falls to 0: there is no current of maximum COP');
  }
  return { pumpingRange: [lower, upper], maxHeatLoad: top, maxCop, warnings };
}

const fmt = (v: number) => Number(v.toPrecision(5)).toString();

/** The full curve: summary plus samples over the pumping range. */
export function curveOf(solver: DeviceSolver, conditions: CurveConditions, options: CurveOptions, what: string): OperatingCurve {
  const c = checkConditions(conditions);
  const o = checkCurveOptions(options);
  const summary = operatingSummary(solver, c, what);
  const [lo, hi] = summary.pumpingRange;
  const plates = solver.device.coldPlateResistance > 0 || solver.device.hotPlateResistance > 0;
  const samples: DevicePoint[] = [];
  for (let k = 0; k < o.points; k++) {
    const current = k === o.points - 1 ? hi : lo + ((hi - lo) * k) / (o.points - 1);
    const p = solver.at(current, c.hotSide, { coldSide: c.coldSide });
    if (!p) throw new CaseError(c.field, `${what} has no steady state at ${fmt(current)} A inside its pumping range; try a smaller ΔT`);
    samples.push(p);
  }
  return {
    hotSide: c.hotSide,
    coldSide: c.coldSide,
    deltaT: c.deltaT,
    pumpingRange: summary.pumpingRange,
    currents: samples.map((p) => p.current),
    heatLoad: samples.map((p) => p.heatLoad),
    heatRejected: samples.map((p) => p.heatRejected),
    voltage: samples.map((p) => p.voltage),
    power: samples.map((p) => p.power),
    cop: samples.map((p) => p.cop),
    ...(plates ? { coldJunction: samples.map((p) => p.coldJunction), hotJunction: samples.map((p) => p.hotJunction) } : {}),
    overLimit: samples.map((p) => o.currentLimit !== null && p.current > o.currentLimit),
    currentLimit: o.currentLimit,
    maxHeatLoad: flagged(summary.maxHeatLoad, o.currentLimit),
    maxCop: summary.maxCop && flagged(summary.maxCop, o.currentLimit),
    warnings: summary.warnings,
    evaluations: solver.evaluations(),
  };
}
