/**
 * Where bipolar conduction sets in, for the family plots: the share of the
 * current minority carriers carry (σ_minority/σ, in %) against doping, and
 * the doping below which it passes 5 % at a temperature. Two-band families
 * only (the engine's `minorityShare`).
 */
import { BIPOLAR_SHARE, type MaterialFamily } from '@/shared/engine';
import { logSpaced } from './family-curves';
import type { PlotPoint } from './line-plot-types';

/** Shares below this (0.01 %) are left off the log-scale plot. */
const FLOOR_PERCENT = 0.01;

/** Minority share of the current [%] against doping [cm⁻³] at T [K]. */
export function minorityShareVsDoping(family: MaterialFamily, temperature: number, range: { min: number; max: number }): PlotPoint[] {
  const share = family.minorityShare;
  if (!share) return [];
  return logSpaced(range.min, range.max)
    .map((n) => ({ x: n, y: 100 * share.call(family, Math.log10(n), temperature) }))
    .filter((p) => p.y >= FLOOR_PERCENT);
}

/** Where the share crosses 5 % at T: below some doping, at every doping of the range, or nowhere in it. */
export type BipolarOnset = { kind: 'below'; perCm3: number } | { kind: 'everywhere' } | { kind: 'nowhere' };

/**
 * The doping where σ_minority/σ = 5 % at T, by bisection in log10 n (the
 * share falls as the net doping rises: more majority carriers, fewer
 * minority ones by the mass-action law).
 */
export function bipolarOnset(family: MaterialFamily, temperature: number, range: { min: number; max: number }): BipolarOnset | null {
  const share = family.minorityShare;
  if (!share) return null;
  const excess = (y: number) => share.call(family, y, temperature) - BIPOLAR_SHARE;
  let lo = Math.log10(range.min);
  let hi = Math.log10(range.max);
  if (excess(lo) <= 0) return { kind: 'nowhere' };
  if (excess(hi) > 0) return { kind: 'everywhere' };
  for (let k = 0; k < 50 && hi - lo > 1e-4; k++) {
    const mid = 0.5 * (lo + hi);
    if (excess(mid) > 0) lo = mid;
    else hi = mid;
  }
  return { kind: 'below', perCm3: Math.pow(10, 0.5 * (lo + hi)) };
}
