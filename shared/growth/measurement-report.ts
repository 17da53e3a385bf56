import { materialSchema, parseCase } from '../engine';
import { hallCorrection } from '../engine/hall-factor';
import { predictAsGrown, zoneVerdicts, type ZoneVerdict } from './as-grown';
import type { GrowthSheet } from './growth-sheet';
import { invertDoping } from './invert-doping';
import type { MeasuredPoint } from './parse-measurements';
import { judgeReadings, zoneAt, type Reading } from './point-verdicts';
import { problemOf } from './zoning';

/** S and σ giving doping estimates further apart than this (decades) are flagged. */
export const DISAGREEMENT_DECADES = 0.15;

/**
 * `fromHall` is the carrier concentration behind the Hall reading
 * (r_H × `hallPerCm3`, the Hall concentration as uploaded), `hallFactor` the r_H used.
 */
export type InferredPoint = {
  line: number; positionMm: number; perCm3: number; fromSeebeck: number | null; fromSigma: number | null; fromHall: number | null;
  hallPerCm3?: number | null; hallFactor?: number | null; disagree: boolean; outOfRange: boolean;
  /** The zone (0 = cold end) the position lies in, and each of its readings against that zone's band. */
  zone: number;
  readings: Reading[];
};

/** Which Hall factor turned Hall concentrations into carrier concentrations, stated on the report. */
export type HallFactorUsed = {
  source: 'band-model' | 'entered' | 'none';
  /** Smallest and largest r_H applied (equal for an entered or absent factor). */
  min: number;
  max: number;
  note: string;
};

export type ReportOptions = { /** r_H entered by hand on the upload; overrides the band model. */ hallFactor?: number };

export type MeasurementReport = {
  zones: number;
  points: InferredPoint[];
  verdicts: ZoneVerdict[];
  target: { value: number; deltaT: number; current: number };
  /** Null when no Hall concentration was uploaded. */
  hall?: HallFactorUsed | null;
  asGrown: { atDesignCurrent: { value: number; deltaT: number; feasible: boolean }; atBestCurrent: { value: number; deltaT: number; current: number; feasible: boolean } };
  warnings: string[];
};

/**
 * Infers the doping at each measured position from the family (inverting
 * S(n) and/or σ(n) at the measurement temperature, or taking a Hall value),
 * predicts the as-grown leg with the engine, and judges each reading and
 * each zone against the zone's tolerance band.
 */
export function reportMeasurements(caseJson: unknown, sheet: GrowthSheet, zones: number, points: MeasuredPoint[], temperature: number, options: ReportOptions = {}): MeasurementReport {
  const c = parseCase(caseJson, 'optimize');
  if (c.leg.kind !== 'family' || !c.leg.bounds) throw new Error('measurements need a doping-controlled family');
  const family = c.leg.family;
  const step = sheet.steps.find((s) => s.zones === zones) ?? sheet.steps[sheet.steps.length - 1]!;
  const warnings: string[] = [];
  // Invert over the family's whole range, not the design bounds: a piece may be grown outside them.
  const lo = Math.max(14, family.minLog10Doping);
  const hi = Math.min(22, family.maxLog10Doping);
  const material = materialSchema.safeParse((caseJson as { material?: unknown } | null)?.material);
  const band = material.success && material.data.kind === 'band' ? material.data : null;
  const hallFactors: number[] = [];
  const inferred = points.map((q): InferredPoint => {
    const t = q.temperature ?? temperature;
    const est = q.seebeck !== undefined || q.sigma !== undefined ? invertDoping(family, t, { seebeck: q.seebeck, sigma: q.sigma }, lo, hi) : null;
    // p = r_H·p_H: the hand-entered factor, else the band model's at this point's η, else 1 (a table has no band model).
    const hallFactor = q.perCm3 === undefined ? null : options.hallFactor ?? (band ? hallCorrection(band, q.perCm3, t).factor : 1);
    if (hallFactor !== null) hallFactors.push(hallFactor);
    const fromHall = q.perCm3 === undefined || hallFactor === null ? null : hallFactor * q.perCm3;
    const values = [est?.fromSeebeck, est?.fromSigma, fromHall].filter((v): v is number => typeof v === 'number');
    const log10 = values.reduce((a, v) => a + Math.log10(v), 0) / values.length;
    const spread = values.length > 1 ? Math.max(...values.map(Math.log10)) - Math.min(...values.map(Math.log10)) : 0;
    const zone = zoneAt(step.layout.fractions, q.positionMm / sheet.lengthMm);
    const readings = judgeReadings(family, step.rows[zone]!, t, { seebeck: q.seebeck, sigma: q.sigma, carrierPerCm3: fromHall });
    return {
      zone, readings,
      line: q.line, positionMm: q.positionMm, perCm3: 10 ** log10, fromSeebeck: est?.fromSeebeck ?? null, fromSigma: est?.fromSigma ?? null, fromHall,
      hallPerCm3: q.perCm3 ?? null, hallFactor,
      disagree: spread > DISAGREEMENT_DECADES, outOfRange: est?.outOfRange ?? false,
    };
  });
  for (const q of inferred) {
    if (q.disagree) warnings.push(`line ${q.line} (${q.positionMm} mm): the doping inferred from each measurement differs by more than ${DISAGREEMENT_DECADES} decades`);
    if (q.outOfRange) warnings.push(`line ${q.line} (${q.positionMm} mm): the measurement lies beyond what the family reaches`);
  }
  const hall = hallFactors.length === 0 ? null : hallUsed(options.hallFactor !== undefined ? 'entered' : band ? 'band-model' : 'none', hallFactors);
  const p = problemOf(c, 1e-8);
  const grown = inferred.map((q) => ({ positionFraction: q.positionMm / sheet.lengthMm, log10: Math.log10(q.perCm3) }));
  const judged = inferred.map((q, i) => ({ ...grown[i]!, readings: q.readings.length, outside: q.readings.filter((r) => r.verdict !== 'within').length }));
  const bands = step.rows.map((r) => ({ zone: r.index, perCm3: r.perCm3, lowPerCm3: r.lowPerCm3, highPerCm3: r.highPerCm3, lowAtBound: r.lowAtBound, highAtBound: r.highAtBound, slope: 0, curvature: 0, lossAtLow: r.lossAtLow, lossAtHigh: r.lossAtHigh }));
  const prediction = predictAsGrown(p, grown, step.current);
  return {
    zones: step.zones,
    points: inferred,
    verdicts: zoneVerdicts(step.layout, bands, judged),
    target: { value: step.value, deltaT: step.deltaT, current: step.current },
    hall,
    asGrown: {
      atDesignCurrent: { value: prediction.atDesignCurrent.value, deltaT: prediction.atDesignCurrent.deltaT, feasible: prediction.atDesignCurrent.feasible },
      atBestCurrent: { value: prediction.atBestCurrent.value, deltaT: prediction.atBestCurrent.deltaT, current: prediction.atBestCurrent.current, feasible: prediction.atBestCurrent.feasible },
    },
    warnings,
  };
}

const r3 = (v: number): string => v.toFixed(3);

/** The sentence the report shows (and exports) about the Hall factor. */
function hallUsed(source: HallFactorUsed['source'], factors: number[]): HallFactorUsed {
  const min = Math.min(...factors);
  const max = Math.max(...factors);
  const range = max - min < 5e-4 ? `r_H = ${r3(min)}` : `r_H = ${r3(min)}–${r3(max)}`;
  const note = source === 'entered'
    ? `Hall factor entered by hand: ${range}; carrier concentration = r_H × Hall concentration.`
    : source === 'band-model'
      ? `Hall factor from the band model (one parabolic band, acoustic-phonon scattering, at each point's Fermi level): ${range}; carrier concentration = r_H × Hall concentration.`
      : 'Hall factor 1: a measured-table family has no band model to give one, so the Hall concentration is taken as the carrier concentration (enter the factor on the upload if it is known).';
  return { source, min, max, note };
}
