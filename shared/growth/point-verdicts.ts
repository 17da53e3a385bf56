import type { MaterialFamily } from '../engine/material-family';
import { propertiesAt } from '../engine/family-helpers';

/** What was measured at one position: Seebeck, conductivity, or a Hall carrier concentration. */
export type ReadingKind = 'seebeck' | 'sigma' | 'hall';

/**
 * One measurement against its zone's band, in the units the grower reads:
 * Seebeck in µV/K (signed as uploaded; judged by magnitude, as the doping is
 * inferred from |S|), conductivity in S/cm, Hall as the carrier concentration
 * r_H × Hall concentration in cm⁻³. `low`–`high` is the band for this reading
 * at the temperature it was measured at (signed like `value` for Seebeck).
 */
export type Reading = { kind: ReadingKind; value: number; low: number; high: number; verdict: 'within' | 'low' | 'high' };

/** The zone's doping band, cm⁻³ (the sheet's joint band). */
export type DopingBand = { lowPerCm3: number; highPerCm3: number };

/** What one position measured, in engine units (V/K, S/m) and the carrier concentration behind a Hall reading (cm⁻³). */
export type PointReadings = { seebeck?: number; sigma?: number; carrierPerCm3?: number | null };

/** Outside by more than this relative amount: a reading printed at a band edge is inside it. */
const EDGE = 1e-9;

function judge(value: number, a: number, b: number): Reading['verdict'] {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  return value < lo * (1 - EDGE) ? 'low' : value > hi * (1 + EDGE) ? 'high' : 'within';
}

/**
 * Each reading of a position against its zone's band. The S and σ bands are
 * the family's S and σ at the band's doping edges at temperature `t` — the
 * very numbers the sheet prints when `t` is its check temperature — so a
 * reading is judged by what it is, not only through the doping averaged
 * from all of a position's readings (which can sit inside the band while
 * each reading lies outside it).
 */
export function judgeReadings(family: MaterialFamily, band: DopingBand, t: number, m: PointReadings): Reading[] {
  const atLow = propertiesAt(family, band.lowPerCm3, t);
  const atHigh = propertiesAt(family, band.highPerCm3, t);
  const out: Reading[] = [];
  if (m.seebeck !== undefined) {
    const value = m.seebeck * 1e6;
    const sign = value < 0 ? -1 : 1;
    const edges = [Math.abs(atHigh.seebeck), Math.abs(atLow.seebeck)].map((v) => v * 1e6).sort((a, b) => a - b) as [number, number];
    out.push({ kind: 'seebeck', value, low: sign * edges[0], high: sign * edges[1], verdict: judge(Math.abs(value), edges[0], edges[1]) });
  }
  if (m.sigma !== undefined) {
    const value = m.sigma / 100;
    const low = Math.min(atLow.sigma, atHigh.sigma) / 100;
    const high = Math.max(atLow.sigma, atHigh.sigma) / 100;
    out.push({ kind: 'sigma', value, low, high, verdict: judge(value, low, high) });
  }
  if (m.carrierPerCm3 !== undefined && m.carrierPerCm3 !== null) {
    out.push({ kind: 'hall', value: m.carrierPerCm3, low: band.lowPerCm3, high: band.highPerCm3, verdict: judge(m.carrierPerCm3, band.lowPerCm3, band.highPerCm3) });
  }
  return out;
}

/**
 * The zone a position lies in: zones are [start, end) from the cold end, the
 * last one closed at the hot end. `fractions` are the zones' lengths as
 * fractions of the leg.
 */
export function zoneAt(fractions: readonly number[], positionFraction: number): number {
  let start = 0;
  for (let k = 0; k < fractions.length; k += 1) {
    const end = start + fractions[k]!;
    if (positionFraction >= start - 1e-9 && (positionFraction < end || (k === fractions.length - 1 && positionFraction <= end + 1e-9))) return k;
    start = end;
  }
  return positionFraction < 0 ? 0 : fractions.length - 1;
}
