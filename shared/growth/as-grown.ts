import type { DopingProblem } from '../engine/doping-problem';
import { gradedLeg, withEnds } from '../engine/leg-profile';
import { newWarmStart, scoreDesign, type DesignScore } from '../engine/evaluate-design';
import { optimizeCurrent } from '../engine/optimize-current';
import { zoneAt } from './point-verdicts';
import type { ZoneTolerance } from './zone-tolerance';
import type { ZoneLayout } from './zoned-leg';

export type GrownPoint = { positionFraction: number; log10: number };

/** A measured position with how many readings it holds and how many of them lie outside its zone's band. */
export type JudgedPoint = GrownPoint & { readings: number; outside: number };

/**
 * 'low'/'high': the zone's doping (geometric mean of its positions) is outside
 * its band; 'stray': the mean is inside but some reading is not — a zone
 * never reads "within" while one of its measurements lies outside the band.
 * `readings`/`readingsOutside` are absent on reports stored before readings were judged.
 */
export type ZoneVerdict = {
  zone: number; measured: number | null; verdict: 'within' | 'low' | 'high' | 'stray' | 'unmeasured'; points: number;
  readings?: number; readingsOutside?: number;
};

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

/**
 * Each zone's measured doping (geometric mean of its points) against its
 * tolerance band, and how many of its readings lie outside the band.
 */
export function zoneVerdicts(layout: ZoneLayout, tolerances: ZoneTolerance[], points: JudgedPoint[]): ZoneVerdict[] {
  return layout.fractions.map((_, k) => {
    const inside = points.filter((q) => zoneAt(layout.fractions, q.positionFraction) === k);
    if (inside.length === 0) return { zone: k, measured: null, verdict: 'unmeasured', points: 0, readings: 0, readingsOutside: 0 };
    const measured = 10 ** (inside.reduce((a, q) => a + q.log10, 0) / inside.length);
    const readings = inside.reduce((a, q) => a + q.readings, 0);
    const readingsOutside = inside.reduce((a, q) => a + q.outside, 0);
    const t = tolerances[k]!;
    const verdict = measured < t.lowPerCm3 ? 'low' : measured > t.highPerCm3 ? 'high' : readingsOutside > 0 ? 'stray' : 'within';
    return { zone: k, measured, verdict, points: inside.length, readings, readingsOutside };
  });
}
