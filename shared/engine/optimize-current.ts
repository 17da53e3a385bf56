/**
 * The current alone: a 1-D maximisation of the objective over I by Brent's
 * method. ΔT(I) and Qc(I) are single-peaked (Peltier cooling grows like I,
 * Joule heating like I²), so a bracket [0, 3·S̄Th/R̄] widened when the peak
 * sits at its edge is enough. For maxCop there is nothing to optimise: the
 * current is fixed by Tc, Th and Qc (see evaluate-design.ts).
 */
import { newWarmStart, referenceCurrent, scoreDesign, type Conditions, type DesignScore, type WarmStart } from './evaluate-design';
import type { Leg } from './leg-profile';
import { brentMinimize } from './minimize-scalar';

export type CurrentOptimum = { score: DesignScore; evaluations: number };

/** Relative precision of the optimal current; the objective is flat there, so 1e-6 is ample. */
const CURRENT_TOLERANCE = 1e-6;

export function optimizeCurrent(leg: Leg, conditions: Conditions, tolerance: number, warm: WarmStart = newWarmStart(leg)): CurrentOptimum {
  if (conditions.objective === 'maxCop') return { score: scoreDesign(leg, 0, conditions, warm, tolerance), evaluations: 1 };
  const reference = referenceCurrent(leg, conditions.hotSide);
  let evaluations = 0;
  let best: DesignScore | undefined;
  const negative = (current: number) => {
    const score = scoreDesign(leg, current, conditions, warm, tolerance);
    evaluations++;
    if (score.feasible && (!best || score.value > best.value)) best = score;
    return score.feasible ? -score.value : Number.MAX_VALUE;
  };
  let upper = 3 * reference;
  let m = brentMinimize(negative, 0, upper, CURRENT_TOLERANCE * reference);
  while (best && m.x > 0.97 * upper && upper < 1e3 * reference) {
    upper *= 3;
    m = brentMinimize(negative, m.x * 0.5, upper, CURRENT_TOLERANCE * reference);
  }
  // Nothing feasible seen (e.g. every current tried drives a table family
  // below its lowest temperature): look closer to zero current, where the
  // leg is closest to isothermal, and optimise below the first feasible one.
  for (let k = 1; !best && k <= 30; k++) {
    const current = upper * Math.pow(0.5, k);
    if (negative(current) < Number.MAX_VALUE) m = brentMinimize(negative, 0, 2 * current, CURRENT_TOLERANCE * reference);
  }
  if (!best) return { score: scoreDesign(leg, m.x, conditions, warm, tolerance), evaluations: evaluations + 1 };
  return { score: best, evaluations };
}
