import { bestUniform } from '../engine/baselines';
import type { CheckedCase } from '../engine/check-case';
import type { DopingProblem } from '../engine/doping-problem';
import { newWarmStart, referenceCurrent, scoreDesign, type DesignScore } from '../engine/evaluate-design';
import { minimizeBox } from '../engine/box-bfgs';
import { optimizeCurrent } from '../engine/optimize-current';
import { withEnds } from '../engine/leg-profile';
import { fractionsFrom, variablesFrom, zonedLeg, type ZoneLayout } from './zoned-leg';

export type ZoningStep = { zones: number; layout: ZoneLayout; score: DesignScore; evaluations: number };

export type ZoningOptions = {
  /** Largest number of zones to try (1…12). */
  maxZones: number;
  /** Shortest zone, as a fraction of the leg length (what the grower can make). */
  minZoneFraction: number;
  /** The continuous optimum, used to seed each K (fractions from the cold end, log10 n). */
  continuous?: { x: number[]; log10: number[] };
  tolerance?: number;
  shouldStop?: () => boolean;
};

/** The doping problem of a checked optimize case, as the engine's optimisers build it. */
export function problemOf(c: CheckedCase, tolerance: number): DopingProblem {
  if (c.leg.kind !== 'family' || !c.leg.bounds) throw new Error('zoning needs a doping-controlled family with bounds');
  return {
    family: c.leg.family, length: c.length, area: c.area,
    conditions: { objective: c.objective, hotSide: c.hotSide, heatLoad: c.heatLoad ?? 0, coldSide: c.coldSide },
    lower: c.leg.bounds.lower, upper: c.leg.bounds.upper, controlPoints: 2, monotone: false, current: c.current, tolerance,
    // The case's contacts and parasitic heat: every zoned, tolerance and as-grown leg carries them.
    ...(c.ends ? { ends: c.ends } : {}),
  };
}

/** Scores a zone layout at a current (or at its best current when `current` is undefined). */
export function scoreLayout(p: DopingProblem, z: ZoneLayout, current: number | undefined): DesignScore {
  const leg = withEnds(zonedLeg(p.length, p.area, p.family, z), p.ends);
  if (current === undefined || p.conditions.objective === 'maxCop') return optimizeCurrent(leg, p.conditions, p.tolerance).score;
  return scoreDesign(leg, current, p.conditions, newWarmStart(leg), p.tolerance);
}

/** Mean of a piecewise-linear log10 profile over [a, b] (fractions), by the trapezoid rule on a fine grid. */
function meanOver(profile: { x: number[]; log10: number[] }, a: number, b: number): number {
  const at = (f: number): number => {
    const i = Math.min(profile.x.length - 2, Math.max(0, profile.x.findIndex((x) => x > f) - 1));
    const t = (f - profile.x[i]!) / (profile.x[i + 1]! - profile.x[i]!);
    return profile.log10[i]! + Math.min(1, Math.max(0, t)) * (profile.log10[i + 1]! - profile.log10[i]!);
  };
  let sum = 0;
  for (let k = 0; k <= 20; k += 1) sum += at(a + ((b - a) * k) / 20) * (k === 0 || k === 20 ? 0.5 : 1);
  return sum / 20;
}

/** K equal zones (or as equal as the minimum allows) at the continuous profile's mean doping. */
function fromContinuous(profile: { x: number[]; log10: number[] }, k: number): ZoneLayout {
  const fractions = Array.from({ length: k }, () => 1 / k);
  return { fractions, log10: fractions.map((_, i) => meanOver(profile, i / k, (i + 1) / k)) };
}

/** The previous layout with its longest zone split in two: as good as before, one more zone to use. */
function split(z: ZoneLayout, minFraction: number): ZoneLayout | null {
  let longest = 0;
  z.fractions.forEach((f, i) => { if (f > z.fractions[longest]!) longest = i; });
  if (z.fractions[longest]! < 2 * minFraction) return null;
  const half = z.fractions[longest]! / 2;
  return {
    fractions: [...z.fractions.slice(0, longest), half, half, ...z.fractions.slice(longest + 1)],
    log10: [...z.log10.slice(0, longest + 1), z.log10[longest]!, ...z.log10.slice(longest + 1)],
  };
}

/**
 * Optimises K zones (doping and lengths, with the current unless fixed) from
 * a start. Box-constrained quasi-Newton (the engine's minimizeBox) on
 * [log10 n_k, u_k (lengths), current/I_ref]; the best point seen is kept.
 */
function optimiseZones(p: DopingProblem, start: ZoneLayout, startScore: DesignScore, minFraction: number, shouldStop?: () => boolean): { layout: ZoneLayout; score: DesignScore; evaluations: number } {
  const k = start.fractions.length;
  const freeCurrent = p.current === undefined && p.conditions.objective !== 'maxCop';
  const reference = referenceCurrent(withEnds(zonedLeg(p.length, p.area, p.family, start), p.ends), p.conditions.hotSide);
  const layoutOf = (v: readonly number[]): ZoneLayout => ({ log10: v.slice(0, k), fractions: fractionsFrom(v.slice(k, 2 * k - 1), minFraction) });
  const scale = Math.max(Math.abs(startScore.value), 1e-30);
  let best = { layout: start, score: startScore };
  let evaluations = 0;
  const f = (v: readonly number[]): number => {
    evaluations += 1;
    const layout = layoutOf(v);
    const score = scoreLayout(p, layout, freeCurrent ? v[2 * k - 1]! * reference : p.current);
    if (score.feasible && score.value > best.score.value) best = { layout, score };
    return score.feasible ? -score.value / scale : Infinity;
  };
  const x0 = [...start.log10, ...variablesFrom(start.fractions, minFraction), ...(freeCurrent ? [startScore.current / reference] : [])];
  const lower = [...start.log10.map(() => p.lower), ...Array(k - 1).fill(-12), ...(freeCurrent ? [1e-3] : [])];
  const upper = [...start.log10.map(() => p.upper), ...Array(k - 1).fill(12), ...(freeCurrent ? [5] : [])];
  minimizeBox(f, x0, { lower, upper, steps: x0.map(() => 1e-5), maxIterations: 120, valueTolerance: 1e-10, shouldStop });
  return { ...best, evaluations };
}

/**
 * ΔT (or the design's objective) versus the number of zones K = 1…maxZones.
 * K = 1 is the best uniform leg. Each K starts from the previous optimum
 * with one zone split (so the objective can only rise with K) and from the
 * continuous profile averaged into K zones; the better wins.
 */
export function zoneProfile(c: CheckedCase, o: ZoningOptions): ZoningStep[] {
  const p = problemOf(c, o.tolerance ?? 1e-8);
  const counter = { evaluations: 0 };
  const uniform = bestUniform(p, counter);
  const steps: ZoningStep[] = [{ zones: 1, layout: { fractions: [1], log10: [uniform.log10] }, score: uniform.score, evaluations: counter.evaluations }];
  for (let k = 2; k <= o.maxZones; k += 1) {
    if (o.shouldStop?.()) break;
    const prev = steps[steps.length - 1]!;
    const seed = split(prev.layout, o.minZoneFraction);
    if (!seed || k * o.minZoneFraction > 1 + 1e-12) break;
    let best = optimiseZones(p, seed, prev.score, o.minZoneFraction, o.shouldStop);
    if (o.continuous) {
      const alt = fromContinuous(o.continuous, k);
      const altScore = scoreLayout(p, alt, undefined);
      if (altScore.feasible) {
        const other = optimiseZones(p, alt, altScore, o.minZoneFraction, o.shouldStop);
        if (other.score.value > best.score.value) best = { ...other, evaluations: other.evaluations + best.evaluations };
      }
    }
    steps.push({ zones: k, layout: best.layout, score: best.score, evaluations: best.evaluations });
  }
  return steps;
}
