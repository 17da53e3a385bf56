import { parseCase } from '../engine';
import { predictAsGrown, zoneVerdicts, type ZoneVerdict } from './as-grown';
import type { GrowthSheet } from './growth-sheet';
import { invertDoping } from './invert-doping';
import type { MeasuredPoint } from './parse-measurements';
import { problemOf } from './zoning';

/** S and σ giving doping estimates further apart than this (decades) are flagged. */
export const DISAGREEMENT_DECADES = 0.15;

export type InferredPoint = { line: number; positionMm: number; perCm3: number; fromSeebeck: number | null; fromSigma: number | null; fromHall: number | null; disagree: boolean; outOfRange: boolean };

export type MeasurementReport = {
  zones: number;
  points: InferredPoint[];
  verdicts: ZoneVerdict[];
  target: { value: number; deltaT: number; current: number };
  asGrown: { atDesignCurrent: { value: number; deltaT: number; feasible: boolean }; atBestCurrent: { value: number; deltaT: number; current: number; feasible: boolean } };
  warnings: string[];
};

/**
 * Infers the doping at each measured position from the family (inverting
 * S(n) and/or σ(n) at the measurement temperature, or taking a Hall value),
 * predicts the as-grown leg with the engine, and judges each zone against its
 * tolerance band.
 */
export function reportMeasurements(caseJson: unknown, sheet: GrowthSheet, zones: number, points: MeasuredPoint[], temperature: number): MeasurementReport {
  const c = parseCase(caseJson, 'optimize');
  if (c.leg.kind !== 'family' || !c.leg.bounds) throw new Error('measurements need a doping-controlled family');
  const family = c.leg.family;
  const step = sheet.steps.find((s) => s.zones === zones) ?? sheet.steps[sheet.steps.length - 1]!;
  const warnings: string[] = [];
  // Invert over the family's whole range, not the design bounds: a piece may be grown outside them.
  const lo = Math.max(14, family.minLog10Doping);
  const hi = Math.min(22, family.maxLog10Doping);
  const inferred = points.map((q): InferredPoint => {
    const t = q.temperature ?? temperature;
    const est = q.seebeck !== undefined || q.sigma !== undefined ? invertDoping(family, t, { seebeck: q.seebeck, sigma: q.sigma }, lo, hi) : null;
    const values = [est?.fromSeebeck, est?.fromSigma, q.perCm3].filter((v): v is number => typeof v === 'number');
    const log10 = values.reduce((a, v) => a + Math.log10(v), 0) / values.length;
    const spread = values.length > 1 ? Math.max(...values.map(Math.log10)) - Math.min(...values.map(Math.log10)) : 0;
    return {
      line: q.line, positionMm: q.positionMm, perCm3: 10 ** log10, fromSeebeck: est?.fromSeebeck ?? null, fromSigma: est?.fromSigma ?? null, fromHall: q.perCm3 ?? null,
      disagree: spread > DISAGREEMENT_DECADES, outOfRange: est?.outOfRange ?? false,
    };
  });
  for (const q of inferred) {
    if (q.disagree) warnings.push(`line ${q.line} (${q.positionMm} mm): the doping inferred from each measurement differs by more than ${DISAGREEMENT_DECADES} decades`);
    if (q.outOfRange) warnings.push(`line ${q.line} (${q.positionMm} mm): the measurement lies beyond what the family reaches`);
  }
  const p = problemOf(c, 1e-8);
  const grown = inferred.map((q) => ({ positionFraction: q.positionMm / sheet.lengthMm, log10: Math.log10(q.perCm3) }));
  const bands = step.rows.map((r) => ({ zone: r.index, perCm3: r.perCm3, lowPerCm3: r.lowPerCm3, highPerCm3: r.highPerCm3, lowAtBound: r.lowAtBound, highAtBound: r.highAtBound, slope: 0, curvature: 0, lossAtLow: r.lossAtLow, lossAtHigh: r.lossAtHigh }));
  const prediction = predictAsGrown(p, grown, step.current);
  return {
    zones: step.zones,
    points: inferred,
    verdicts: zoneVerdicts(step.layout, bands, grown),
    target: { value: step.value, deltaT: step.deltaT, current: step.current },
    asGrown: {
      atDesignCurrent: { value: prediction.atDesignCurrent.value, deltaT: prediction.atDesignCurrent.deltaT, feasible: prediction.atDesignCurrent.feasible },
      atBestCurrent: { value: prediction.atBestCurrent.value, deltaT: prediction.atBestCurrent.deltaT, current: prediction.atBestCurrent.current, feasible: prediction.atBestCurrent.feasible },
    },
    warnings,
  };
}
