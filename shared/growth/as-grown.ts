import type { DopingProblem } from '../engine/doping-problem';
import { gradedLeg, withEnds } from '../engine/leg-profile';
import { newWarmStart, scoreDesign, type DesignScore } from '../engine/evaluate-design';
import { optimizeCurrent } from '../engine/optimize-current';
import type { ZoneTolerance } from './zone-tolerance';
import type { ZoneLayout } from './zoned-leg';

export type GrownPoint = { positionFraction: number; log10: number };

export type ZoneVerdict = { zone: number; measured: number | null; verdict: 'within' | 'low' | 'high' | 'unmeasured'; points: number };

/**
 * The as-grown leg: doping piecewise linear in log10 n between measured
 * positions, constant beyond the first and last. Its performance is
 * predicted at the design's current and at the best current for it, with
 * the design's contacts and parasitic heat.
 */
export function predictAsGrown(p: DopingProblem, points: GrownPoint[], designCurrent: number): { atDesignCurrent: DesignScore; atBestCurrent: DesignScore } {
  const sorted = [...points].sort((a, b) => a.positionFraction - b.positionFraction);
  if (sorted.length === 0) throw new Error('no measured points');
  const x = [0, ...sorted.map((q) => q.positionFraction), 1];
  const y = [sorted[0]!.log10, ...sorted.map((q) => q.log10), sorted[sorted.length - 1]!.log10];
  // Points at the very ends duplicate the end nodes; drop zero-length steps.
  const keep = x.map((_, i) => i === 0 || x[i]! > x[i - 1]! + 1e-12);
  const leg = withEnds(gradedLeg(p.length, p.area, p.family, x.filter((_, i) => keep[i]), y.filter((_, i) => keep[i])), p.ends);
  return {
    atDesignCurrent: scoreDesign(leg, designCurrent, p.conditions, newWarmStart(leg), p.tolerance),
    atBestCurrent: optimizeCurrent(leg, p.conditions, p.tolerance).score,
  };
}

/** Each zone's measured doping (geometric mean of its points) against its tolerance band. */
export function zoneVerdicts(layout: ZoneLayout, tolerances: ZoneTolerance[], points: GrownPoint[]): ZoneVerdict[] {
  let start = 0;
  return layout.fractions.map((f, k) => {
    const end = start + f;
    const inside = points.filter((q) => q.positionFraction >= start - 1e-9 && (q.positionFraction < end || (k === layout.fractions.length - 1 && q.positionFraction <= end + 1e-9)));
    start = end;
    if (inside.length === 0) return { zone: k, measured: null, verdict: 'unmeasured', points: 0 };
    const measured = 10 ** (inside.reduce((a, q) => a + q.log10, 0) / inside.length);
    const t = tolerances[k]!;
    const verdict = measured < t.lowPerCm3 ? 'low' : measured > t.highPerCm3 ? 'high' : 'within';
    return { zone: k, measured, verdict, points: inside.length };
  });
}
