import type { MaterialFamily, Properties } from '../engine/material-family';
import { brentMinimize } from '../engine/minimize-scalar';

export type DopingEstimate = {
  /** Best estimate, cm⁻³ (geometric mean when both S and σ were measured). */
  perCm3: number;
  fromSeebeck: number | null;
  fromSigma: number | null;
  /** Decades between the two estimates; null with one measurement. */
  disagreement: number | null;
  /** The measurement lies beyond what the family reaches within its doping range. */
  outOfRange: boolean;
};

/**
 * Finds log10 n in [lo, hi] where f(log10 n) = target, f monotone (|S| falls
 * and σ rises with doping in a single-band family). Bisection: 60 halvings of
 * a few decades is far below any measurement's precision.
 */
function solveMonotone(f: (y: number) => number, target: number, lo: number, hi: number): { y: number; clamped: boolean } {
  const flo = f(lo) - target;
  const fhi = f(hi) - target;
  if (flo * fhi > 0) return { y: Math.abs(flo) < Math.abs(fhi) ? lo : hi, clamped: true };
  let a = lo;
  let b = hi;
  for (let i = 0; i < 60; i += 1) {
    const m = 0.5 * (a + b);
    if ((f(m) - target) * flo > 0) a = m; else b = m;
  }
  return { y: 0.5 * (a + b), clamped: false };
}

/**
 * Where the extrinsic branch of f begins in [lo, hi]: the doping of the
 * largest f (|S|) or smallest f (ln σ, with `sign` −1). In a two-band family
 * both turn over at low doping — minority carriers cut |S| and, when they are
 * the faster carriers, add to σ — so one reading matches two dopings; the
 * grower's zones lie on the extrinsic (higher-doping) side, which is the one
 * searched. For a single band the turn is at lo and nothing changes.
 */
function extrinsicStart(f: (y: number) => number, sign: 1 | -1, lo: number, hi: number): number {
  const points = 41;
  const h = (hi - lo) / (points - 1);
  let best = 0;
  for (let k = 1; k < points; k += 1) if (sign * f(lo + k * h) > sign * f(lo + best * h)) best = k;
  if (best === 0) return lo;
  if (best === points - 1) return hi;
  return brentMinimize((y) => -sign * f(y), lo + (best - 1) * h, lo + (best + 1) * h, 1e-6).x;
}

/**
 * The doping that reproduces a room-temperature measurement of S [V/K]
 * and/or σ [S/m] at temperature T, within [lower, upper] (log10 cm⁻³).
 */
export function invertDoping(family: MaterialFamily, temperature: number, m: { seebeck?: number; sigma?: number }, lower: number, upper: number): DopingEstimate {
  const out: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
  const at = (y: number): Properties => { family.properties(y, temperature, out); return out; };
  const lo = Math.max(lower, family.minLog10Doping);
  const hi = Math.min(upper, family.maxLog10Doping);
  const absS = (y: number) => Math.abs(at(y).seebeck);
  const lnSigma = (y: number) => Math.log(at(y).sigma);
  const s = m.seebeck !== undefined ? solveMonotone(absS, Math.abs(m.seebeck), extrinsicStart(absS, 1, lo, hi), hi) : null;
  const g = m.sigma !== undefined ? solveMonotone(lnSigma, Math.log(m.sigma), extrinsicStart(lnSigma, -1, lo, hi), hi) : null;
  if (!s && !g) throw new Error('a measurement needs a Seebeck coefficient or a conductivity');
  const ys = [s, g].filter((v): v is { y: number; clamped: boolean } => v !== null);
  const y = ys.reduce((acc, v) => acc + v.y, 0) / ys.length;
  return {
    perCm3: 10 ** y,
    fromSeebeck: s ? 10 ** s.y : null,
    fromSigma: g ? 10 ** g.y : null,
    disagreement: s && g ? Math.abs(s.y - g.y) : null,
    outOfRange: ys.some((v) => v.clamped),
  };
}
