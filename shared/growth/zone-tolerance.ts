import type { DopingProblem } from '../engine/doping-problem';
import type { DesignScore } from '../engine/evaluate-design';
import { scoreLayout } from './zoning';
import type { ZoneLayout } from './zoned-leg';

/** Step in log10 n for the finite-difference derivatives (a 4.7 % change of doping). */
const STEP = 0.02;

export type ZoneTolerance = {
  zone: number;
  /** Target and the band within which the loss stays under the budget, cm⁻³. */
  perCm3: number;
  lowPerCm3: number;
  highPerCm3: number;
  /** True when the band reaches the family's doping bound before the budget is lost. */
  lowAtBound: boolean;
  highAtBound: boolean;
  /** d(objective)/d log10 n and its second derivative, from the model. */
  slope: number;
  curvature: number;
  /** The loss actually computed by re-solving the leg at each band edge (objective units). */
  lossAtLow: number;
  lossAtHigh: number;
};

/**
 * Per zone, the doping band within which the objective loses at most
 * `budget` (K for ΔT), one zone at a time, all else — including the current,
 * as a cooler is run at its set current — held at the design. The quadratic
 * model from the derivatives gives a first guess; each edge is then found by
 * re-solving the leg (bisection), so the quoted band is what the solver
 * confirms, not what the model hopes.
 */
export function zoneTolerances(p: DopingProblem, layout: ZoneLayout, score: DesignScore, budget: number): ZoneTolerance[] {
  const value = (k: number, log10: number): number => {
    const s = scoreLayout(p, { ...layout, log10: layout.log10.map((v, i) => (i === k ? log10 : v)) }, score.current);
    return s.feasible ? s.value : -Infinity;
  };
  return layout.log10.map((y, k) => {
    const up = value(k, y + STEP);
    const down = value(k, y - STEP);
    const slope = (up - down) / (2 * STEP);
    const curvature = (up - 2 * score.value + down) / (STEP * STEP);
    const edge = (direction: 1 | -1): { log10: number; atBound: boolean; loss: number } => {
      const limit = direction > 0 ? p.upper : p.lower;
      const loss = (d: number): number => score.value - value(k, y + direction * d);
      const room = Math.abs(limit - y);
      if (room <= 1e-12 || loss(room) <= budget) return { log10: limit, atBound: true, loss: room <= 1e-12 ? 0 : loss(room) };
      // Quadratic guess for where the loss reaches the budget, then bisection on the solved loss.
      const a = 0.5 * Math.abs(curvature);
      const b = direction * -slope;
      const guess = a > 1e-12 ? (-b + Math.sqrt(Math.max(0, b * b + 4 * a * budget))) / (2 * a) : budget / Math.max(Math.abs(slope), 1e-12);
      let inside = 0;
      let outside = room;
      const g = Math.min(room, Math.max(1e-4, guess));
      if (loss(g) <= budget) inside = g; else outside = g;
      for (let i = 0; i < 30 && outside - inside > 1e-4; i += 1) {
        const mid = 0.5 * (inside + outside);
        if (loss(mid) <= budget) inside = mid; else outside = mid;
      }
      return { log10: y + direction * inside, atBound: false, loss: loss(inside) };
    };
    const low = edge(-1);
    const high = edge(1);
    return {
      zone: k, perCm3: 10 ** y, lowPerCm3: 10 ** low.log10, highPerCm3: 10 ** high.log10, lowAtBound: low.atBound, highAtBound: high.atBound,
      slope, curvature, lossAtLow: low.loss, lossAtHigh: high.loss,
    };
  });
}
