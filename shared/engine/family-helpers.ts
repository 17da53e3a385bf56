/**
 * Material-family helpers for plots and for the local-best-zT baseline:
 * properties and zT at (n, T), and the doping that maximises zT at T.
 */
import type { MaterialFamily, Properties } from './material-family';
import { figureOfMerit } from './material-family';
import { brentMinimize } from './minimize-scalar';

export type LocalProperties = Properties & { zT: number };

/** S [V/K], σ [S/m], κ [W/(m·K)] and zT at doping n [cm⁻³] and T [K]. */
export function propertiesAt(family: MaterialFamily, perCm3: number, temperature: number): LocalProperties {
  const out: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
  family.properties(Math.log10(perCm3), temperature, out);
  return { ...out, zT: figureOfMerit(out, temperature) };
}

/** Points of the coarse scan before Brent refines the best bracket (guards against a second, lower peak). */
const SCAN_POINTS = 17;

/**
 * log10(n / cm⁻³) in [lower, upper] that maximises zT at T: a coarse scan,
 * then Brent's method on the bracket around the best scan point.
 */
export function ztOptimalLog10(family: MaterialFamily, temperature: number, lower: number, upper: number): number {
  const out: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
  const negativeZt = (y: number) => {
    family.properties(y, temperature, out);
    return -figureOfMerit(out, temperature);
  };
  if (upper <= lower) return lower;
  const h = (upper - lower) / (SCAN_POINTS - 1);
  let best = 0;
  let bestValue = Infinity;
  for (let k = 0; k < SCAN_POINTS; k++) {
    const v = negativeZt(lower + k * h);
    if (v < bestValue) {
      bestValue = v;
      best = k;
    }
  }
  const a = lower + Math.max(0, best - 1) * h;
  const b = lower + Math.min(SCAN_POINTS - 1, best + 1) * h;
  const m = brentMinimize(negativeZt, a, b, 1e-7);
  return m.value <= bestValue ? m.x : lower + best * h;
}

/** The zT-optimal doping [cm⁻³] at T within [minPerCm3, maxPerCm3]. */
export function ztOptimalDoping(family: MaterialFamily, temperature: number, minPerCm3: number, maxPerCm3: number): number {
  return Math.pow(10, ztOptimalLog10(family, temperature, Math.log10(minPerCm3), Math.log10(maxPerCm3)));
}
