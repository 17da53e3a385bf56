/**
 * One couple design (a p leg, an n leg, one current) scored for an
 * objective — the function the couple optimiser maximises. The couple is
 * the device of module.ts: both legs electrically in series, thermally in
 * parallel between one cold and one hot junction plane, no plates.
 */
import { deviceSolver, type DevicePoint, type DeviceSolver } from './device';
import { maxHeatLoadPoint } from './device-optima';
import type { Conditions } from './evaluate-design';
import { brentRoot } from './find-root';
import type { Leg } from './leg-profile';

/** A leg's conditions, with the heat load per couple [W]. */
export type CoupleConditions = Conditions;

export type CoupleScore = {
  feasible: boolean;
  /** ΔT [K], Qc [W] or COP; −∞ (or a negative shortfall for maxCop) when infeasible. */
  value: number;
  current: number;
  point: DevicePoint | null;
};

/** Counts leg solves over a whole optimisation. */
export type SolveCounter = { evaluations: number };

/** A solver for one leg alone, or for the couple (p + n, one current). */
export function legsSolver(legs: Leg[], tolerance: number): DeviceSolver {
  return deviceSolver({ legs: legs.map((leg) => ({ leg, count: 1 })), coldPlateResistance: 0, hotPlateResistance: 0 }, tolerance);
}

/** Relative precision of maxCop's current (the smaller root of Qc(I) = heat load). */
const ROOT_TOLERANCE = 1e-10;

/**
 * The point at which a device (a couple, or one leg) draws `heatLoad` from
 * the load at the given junction temperatures with the least current — the
 * smaller root of Qc(I) = heatLoad below the current of maximum Qc. With
 * Qc fixed, P = Qh − Qc grows with I, so that root has the best COP.
 * `shortfall` when even the maximum Qc is below the load.
 */
export function leastCurrentFor(solver: DeviceSolver, hotSide: number, coldSide: number, heatLoad: number, hint?: number): { point: DevicePoint } | { shortfall: number; top: DevicePoint | undefined } {
  const top = maxHeatLoadPoint(solver, hotSide, coldSide, hint);
  if (!top || top.heatLoad < heatLoad) return { shortfall: top ? heatLoad - top.heatLoad : Infinity, top };
  const at = (i: number) => solver.at(i, hotSide, { coldSide });
  const zero = at(0);
  if (!zero) return { shortfall: Infinity, top };
  if (zero.heatLoad >= heatLoad) return { point: zero };
  let found: DevicePoint | undefined;
  const root = brentRoot(
    (i) => {
      const p = at(i);
      found = p;
      return p ? p.heatLoad - heatLoad : Infinity;
    },
    0,
    top.current,
    zero.heatLoad - heatLoad,
    top.heatLoad - heatLoad,
    ROOT_TOLERANCE * top.current,
  );
  const point = found && found.current === root.root ? found : at(root.root);
  return point ? { point } : { shortfall: Infinity, top };
}

/**
 * Score the couple at a current (ignored for maxCop, where Tc, Th and Qc set
 * it). `hint`: the last maxCop current, to bracket the next one narrowly.
 * `reuse`: a couple solver used for neighbouring designs (an optimiser's
 * finite differences and line searches); only its first guesses depend on
 * what it solved before, never the answer.
 */
export function scoreCouple(p: Leg, n: Leg, current: number, conditions: CoupleConditions, tolerance: number, counter: SolveCounter, hint?: number, reuse?: DeviceSolver): CoupleScore {
  const solver = reuse ?? legsSolver([p, n], tolerance);
  if (reuse) {
    // Same solver, new legs: its junction guesses and shooting roots from the last design carry over.
    reuse.device.legs[0].leg = p;
    reuse.device.legs[1].leg = n;
  }
  const before = solver.evaluations();
  const { hotSide, heatLoad } = conditions;
  try {
    if (conditions.objective === 'maxDeltaT') {
      const point = solver.at(current, hotSide, { heatLoad }) ?? null;
      return point ? { feasible: true, value: hotSide - point.coldJunction, current, point } : { feasible: false, value: -Infinity, current, point };
    }
    const coldSide = conditions.coldSide as number;
    if (conditions.objective === 'maxHeatLoad') {
      const point = solver.at(current, hotSide, { coldSide }) ?? null;
      return point ? { feasible: true, value: point.heatLoad, current, point } : { feasible: false, value: -Infinity, current, point };
    }
    const r = leastCurrentFor(solver, hotSide, coldSide, heatLoad, hint);
    if ('shortfall' in r) {
      // The negative shortfall pulls an optimiser towards designs that can carry the load.
      const shortfall = Number.isFinite(r.shortfall) ? r.shortfall / Math.max(heatLoad, 1e-30) : Infinity;
      return { feasible: false, value: Number.isFinite(shortfall) ? -shortfall : -Infinity, current: r.top?.current ?? 0, point: null };
    }
    return { feasible: true, value: r.point.cop ?? 0, current: r.point.current, point: r.point };
  } finally {
    counter.evaluations += solver.evaluations() - before;
  }
}
