/**
 * What sharing one current costs a couple. In a couple both legs carry the
 * same current I, so leg k runs at J_k = I/A_k; alone, each would choose its
 * own. For each leg, at the couple's junction temperatures:
 * - maxDeltaT: the current of its largest ΔT with the couple's heat load per
 *   unit leg area (Q·A_k/(A_p + A_n));
 * - maxHeatLoad: its current of maximum Qc;
 * - maxCop: its current of maximum COP (its maximum-Qc current when it cannot
 *   pump at that ΔT alone);
 * gives ownCurrentDensity = I_own/A_k. The cost compares the couple with the
 * same two legs powered separately (two currents, same Th, same Tc or total
 * heat load): the largest ΔT at which max Qc_p(Tc) + max Qc_n(Tc) still
 * carries the load; the sum of the two maximum heat loads; the best COP
 * over the split of the load between the legs. Separate ≥ shared always
 * (one current is a special case of two), so cost ≥ 0; for constant
 * properties it vanishes when S_p/R_p = |S_n|/R_n.
 */
import { CaseError } from './case-error';
import { leastCurrentFor, legsSolver, type CoupleConditions, type SolveCounter } from './couple-score';
import type { DevicePoint, DeviceSolver } from './device';
import { maxHeatLoadPoint } from './device-optima';
import { brentRoot } from './find-root';
import type { Leg } from './leg-profile';
import { brentMinimize } from './minimize-scalar';
import { checkConditions, operatingSummary } from './operating-curve';
import { optimizeCurrent } from './optimize-current';

export type Mismatch = {
  /** Each leg's own best current [A] under the rules above. */
  ownCurrent: { p: number; n: number };
  /** The objective with the legs powered separately (K, W or COP). */
  separateObjective: number;
  /** separateObjective − the couple's objective, ≥ 0. */
  cost: number;
  unit: 'K' | 'W' | '';
};

const UNITS = { maxDeltaT: 'K', maxHeatLoad: 'W', maxCop: '' } as const;

/** Tc is found to this × Th [K]. */
const COLD_TOLERANCE = 1e-10;

function withCount<T>(solver: DeviceSolver, counter: SolveCounter, run: () => T): T {
  const before = solver.evaluations();
  try {
    return run();
  } finally {
    counter.evaluations += solver.evaluations() - before;
  }
}

/** The largest Qc of one leg at fixed junctions (−∞ without a steady state). */
function maxQc(solver: DeviceSolver, hotSide: number, coldSide: number, counter: SolveCounter): DevicePoint | undefined {
  return withCount(solver, counter, () => maxHeatLoadPoint(solver, hotSide, coldSide));
}

/** Legs powered separately, largest ΔT: the lowest Tc with max Qc_p(Tc) + max Qc_n(Tc) = Q. */
function separateDeltaT(solvers: DeviceSolver[], hotSide: number, heatLoad: number, coupleCold: number, counter: SolveCounter): number {
  const g = (tc: number) => solvers.reduce((sum, s) => sum + (maxQc(s, hotSide, tc, counter)?.heatLoad ?? -Infinity), 0) - heatLoad;
  const gHigh = g(coupleCold);
  // The shared current is one of the separate choices: g ≥ 0 there up to the solves' accuracy.
  if (!(gHigh > 0)) return hotSide - coupleCold;
  let step = 0.02 * (hotSide - coupleCold) + 0.5;
  let low = coupleCold - step;
  let gLow = g(low);
  while (gLow > 0 && low > step) {
    step *= 2;
    low = Math.max(0.5 * low, coupleCold - step);
    gLow = g(low);
  }
  if (gLow > 0) return hotSide - low;
  const lowFinite = Number.isFinite(gLow) ? gLow : -1;
  return hotSide - brentRoot(g, low, coupleCold, lowFinite, gHigh, COLD_TOLERANCE * hotSide).root;
}

/** Legs powered separately, best COP: the split of Q between the legs that needs the least power. */
function separateCop(solvers: DeviceSolver[], hotSide: number, coldSide: number, heatLoad: number, counter: SolveCounter): number {
  const [sp, sn] = solvers;
  const range = solvers.map((s) => {
    const zero = withCount(s, counter, () => s.at(0, hotSide, { coldSide }));
    return { low: zero?.heatLoad ?? 0, high: maxQc(s, hotSide, coldSide, counter)?.heatLoad ?? -Infinity };
  });
  const lo = Math.max(range[0].low, heatLoad - range[1].high);
  const hi = Math.min(range[0].high, heatLoad - range[1].low);
  const power = (s: DeviceSolver, q: number) => {
    const r = withCount(s, counter, () => leastCurrentFor(s, hotSide, coldSide, q));
    return 'point' in r ? r.point.power : Infinity;
  };
  const total = (qp: number) => power(sp, qp) + power(sn, heatLoad - qp);
  if (!(hi > lo)) return heatLoad / total(lo);
  const m = brentMinimize(total, lo, hi, 1e-9 * Math.max(Math.abs(lo), Math.abs(hi), heatLoad));
  return heatLoad / Math.min(m.value, total(lo), total(hi));
}

/** A leg's current of maximum COP at fixed junctions; its maximum-Qc current if it cannot pump there alone. */
function ownCopCurrent(solver: DeviceSolver, hotSide: number, coldSide: number, counter: SolveCounter): number {
  return withCount(solver, counter, () => {
    try {
      const s = operatingSummary(solver, checkConditions({ hotSide, coldSide }), 'the leg');
      return (s.maxCop ?? s.maxHeatLoad).current;
    } catch (e) {
      if (!(e instanceof CaseError)) throw e;
      return maxHeatLoadPoint(solver, hotSide, coldSide)?.current ?? NaN;
    }
  });
}

/** Mismatch of a couple at its optimum `point` (junction temperatures, current, objective value). */
export function mismatchOf(p: Leg, n: Leg, point: DevicePoint, objectiveValue: number, conditions: CoupleConditions, tolerance: number, counter: SolveCounter): Mismatch {
  const { hotSide, objective } = conditions;
  const coldSide = point.coldJunction;
  const solvers = [legsSolver([p], tolerance), legsSolver([n], tolerance)];
  const totalArea = p.area + n.area;
  let own: number[];
  let separate: number;
  if (objective === 'maxDeltaT') {
    own = [p, n].map((leg) => {
      const r = optimizeCurrent(leg, { objective: 'maxDeltaT', hotSide, heatLoad: (conditions.heatLoad * leg.area) / totalArea }, tolerance);
      counter.evaluations += r.evaluations;
      return r.score.current;
    });
    separate = separateDeltaT(solvers, hotSide, conditions.heatLoad, coldSide, counter);
  } else if (objective === 'maxHeatLoad') {
    const tops = solvers.map((s) => maxQc(s, hotSide, coldSide, counter));
    own = tops.map((t) => t?.current ?? NaN);
    separate = tops.reduce((sum, t) => sum + (t?.heatLoad ?? 0), 0);
  } else {
    own = solvers.map((s) => ownCopCurrent(s, hotSide, coldSide, counter));
    separate = separateCop(solvers, hotSide, coldSide, conditions.heatLoad, counter);
  }
  return { ownCurrent: { p: own[0], n: own[1] }, separateObjective: Math.max(separate, objectiveValue), cost: Math.max(0, separate - objectiveValue), unit: UNITS[objective] };
}
