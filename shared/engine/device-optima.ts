/**
 * The two optima every curve is built on, each by Brent's minimiser over the
 * current on [0, 2·I_ref] (widened while the optimum sits at the bracket's
 * edge): the current of maximum Qc at fixed load and sink temperatures, and
 * the current of the largest ΔT with no heat load.
 */
import type { DevicePoint, DeviceSolver } from './device';
import { brentMinimize } from './minimize-scalar';

/** Relative precision of the optimal currents; Qc and COP are flat there, so 1e-6 is ample. */
export const CURRENT_TOLERANCE = 1e-6;
/** How far the current bracket may be widened, in units of the reference current. */
export const MAX_WIDENING = 1e3;
/** A hinted bracket starts at this fraction of the hint (and reaches 1.16 × the hint). */
const HINT_LOWER = 0.9;
const GOLDEN = 0.5 * (3 - Math.sqrt(5));

/**
 * The point maximising score over the current: Brent on [0, 2·I_ref],
 * widened while the optimum sits at the edge; if nothing there has a steady
 * state, closer to zero current. With a hint (the optimum of a neighbouring
 * problem) Brent first tries [0.9·hint, 1.16·hint] and keeps that answer
 * unless it lands on the bracket's edge.
 */
function maximizeOverCurrent(at: (current: number) => DevicePoint | undefined, score: (p: DevicePoint) => number, reference: number, hint?: number): DevicePoint | undefined {
  let best: DevicePoint | undefined;
  let bestScore = -Infinity;
  const negative = (current: number) => {
    const p = at(current);
    if (!p) return Number.MAX_VALUE;
    const v = score(p);
    if (v > bestScore) {
      best = p;
      bestScore = v;
    }
    return -v;
  };
  const tolerance = CURRENT_TOLERANCE * reference;
  if (hint !== undefined && hint > 0) {
    // Brent's first point is the golden section of the bracket: put it on the hint.
    const a = hint * HINT_LOWER;
    const b = hint * (HINT_LOWER + (1 - HINT_LOWER) / GOLDEN);
    const m = brentMinimize(negative, a, b, tolerance);
    if (best && m.x > a + 0.03 * (b - a) && m.x < b - 0.03 * (b - a)) return best;
  }
  let upper = 2 * reference;
  let m = brentMinimize(negative, 0, upper, tolerance);
  while (best && m.x > 0.97 * upper && upper < MAX_WIDENING * reference) {
    upper *= 2;
    m = brentMinimize(negative, 0.5 * m.x, upper, tolerance);
  }
  for (let k = 1; !best && k <= 30; k++) {
    const current = upper * Math.pow(0.5, k);
    if (negative(current) < Number.MAX_VALUE) brentMinimize(negative, 0, 2 * current, tolerance);
  }
  return best;
}

/** The current of maximum heat load with the load and the sink at fixed temperatures; undefined if no current gives a steady state. */
export function maxHeatLoadPoint(solver: DeviceSolver, hotSide: number, coldSide: number, hint?: number): DevicePoint | undefined {
  return maximizeOverCurrent((current) => solver.at(current, hotSide, { coldSide }), (p) => p.heatLoad, solver.referenceCurrent(hotSide), hint);
}

/** The largest ΔT with no heat load, over all currents. */
export function maxDeltaTPoint(solver: DeviceSolver, hotSide: number): DevicePoint | undefined {
  return maximizeOverCurrent((current) => solver.at(current, hotSide, { heatLoad: 0 }), (p) => hotSide - p.coldSide, solver.referenceCurrent(hotSide));
}
