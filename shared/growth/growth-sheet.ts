import { parseCase, propertiesAt } from '../engine';
import type { LegEnds, Objective } from '../engine';
import { DEFAULT_DOPING_SCATTER, estimateYield, type YieldEstimate } from './growth-yield';
import { jointZoneBands, type JointBandCheck } from './zone-tolerance';
import { problemOf, zoneProfile } from './zoning';
import type { ZoneLayout } from './zoned-leg';
import type { DopingProblem } from '../engine/doping-problem';

/** What the grower reads for one zone, in the trade's units. */
export type SheetZone = {
  index: number;
  startMm: number;
  endMm: number;
  perCm3: number;
  lowPerCm3: number;
  highPerCm3: number;
  lowAtBound: boolean;
  highAtBound: boolean;
  /** Objective lost at each band edge, as re-solved (K for ΔT). */
  lossAtLow: number;
  lossAtHigh: number;
  /** What a room-temperature check should read at the target and across the band. */
  seebeckUvK: number;
  sigmaSCm: number;
  seebeckBandUvK: [number, number];
  sigmaBandSCm: [number, number];
};

/**
 * One zone count. `joint` says how the bands were made to hold for the whole
 * leg; `yield` is the Monte Carlo of as-grown legs at the sheet's scatter.
 */
export type SheetStep = { zones: number; value: number; deltaT: number; current: number; layout: ZoneLayout; rows: SheetZone[]; joint: JointBandCheck; yield: YieldEstimate };

export type GrowthSheet = {
  objective: Objective;
  /** Unit of `value` and of the loss budget. */
  unit: 'K' | 'W' | '';
  lossBudget: number;
  measureTemperature: number;
  /** The grower's typical doping scatter per zone used for the yields, decades (1σ). */
  dopingScatter: number;
  lengthMm: number;
  minZoneMm: number;
  continuous: { value: number; deltaT: number };
  steps: SheetStep[];
  /** Contacts (Ω·m²) and parasitic heat every leg on the sheet was computed with; null = ideal, none (absent on sheets computed before). */
  ends?: LegEnds | null;
};

export type SheetOptions = {
  lengthMm: number; minZoneMm: number; maxZones: number; lossBudget: number; measureTemperature: number;
  /** Decades (1σ) per zone for the yield; default DEFAULT_DOPING_SCATTER. */
  dopingScatter?: number;
  yieldSamples?: number;
  shouldStop?: () => boolean;
  /** Fraction of the sheet's work done (0…1), a few times a second at most. */
  onProgress?: (fraction: number) => void;
};

/** Yields of every step, reported as one progress bar over all of them. */
function stepYields(p: DopingProblem, steps: Array<{ layout: ZoneLayout; value: number; current: number }>, budget: number, scatter: number, samples: number | undefined, onProgress?: (fraction: number) => void, shouldStop?: () => boolean): YieldEstimate[] {
  return steps.map((s, i) => estimateYield(p, s.layout, s, budget, scatter, {
    samples, shouldStop, onProgress: onProgress ? (done, total) => onProgress((i + done / total) / steps.length) : undefined,
  }));
}

/**
 * The same sheet with its yields recomputed at another scatter: the zoning
 * and the bands do not depend on it, so only the Monte Carlo runs again.
 */
export function withYields(caseJson: unknown, sheet: GrowthSheet, dopingScatter: number, o: { samples?: number; onProgress?: (fraction: number) => void } = {}): GrowthSheet {
  const p = problemOf(parseCase(caseJson, 'optimize'), 1e-8);
  const yields = stepYields(p, sheet.steps, sheet.lossBudget, dopingScatter, o.samples, o.onProgress);
  return { ...sheet, dopingScatter, steps: sheet.steps.map((s, i) => ({ ...s, yield: yields[i]! })) };
}

const unitOf = (o: Objective): GrowthSheet['unit'] => (o === 'maxDeltaT' ? 'K' : o === 'maxHeatLoad' ? 'W' : '');

/**
 * The growth sheet of a converged run: for K = 1…maxZones, the zones that
 * lose the least against the continuous profile, each with its tolerance
 * band (holding jointly for the whole leg), the room-temperature S and σ the
 * grower can check, and the yield at the grower's doping scatter.
 */
export function buildGrowthSheet(caseJson: unknown, continuous: { x: number[]; perCm3: number[]; value: number; deltaT: number }, o: SheetOptions): GrowthSheet {
  const c = parseCase(caseJson, 'optimize');
  if (c.leg.kind !== 'family') throw new Error('a growth sheet needs a doping-controlled family');
  const family = c.leg.family;
  const p = problemOf(c, 1e-8);
  // Never ask for zones shorter than the grower's minimum, nor more than fit.
  const minFraction = Math.min(o.minZoneMm / o.lengthMm, 1);
  const maxZones = Math.max(1, Math.min(o.maxZones, minFraction > 0 ? Math.floor(1 / minFraction + 1e-9) : o.maxZones));
  const scatter = o.dopingScatter ?? DEFAULT_DOPING_SCATTER;
  // Zoning is about half of the work, bands and yields the rest; the bar moves through all three.
  const progress = (from: number, span: number) => (f: number): void => o.onProgress?.(from + span * f);
  const steps = zoneProfile(c, { maxZones, minZoneFraction: minFraction, continuous: { x: continuous.x, log10: continuous.perCm3.map(Math.log10) }, shouldStop: o.shouldStop });
  progress(0, 0.5)(1);
  const room = (n: number) => propertiesAt(family, n, o.measureTemperature);
  const joint = steps.map((s, i) => {
    const j = jointZoneBands(p, s.layout, s.score, o.lossBudget);
    progress(0.5, 0.2)((i + 1) / steps.length);
    return j;
  });
  const yields = stepYields(p, steps.map((s) => ({ layout: s.layout, value: s.score.value, current: s.score.current })), o.lossBudget, scatter, o.yieldSamples, progress(0.7, 0.3), o.shouldStop);
  return {
    objective: c.objective, unit: unitOf(c.objective), lossBudget: o.lossBudget, measureTemperature: o.measureTemperature, dopingScatter: scatter,
    lengthMm: o.lengthMm, minZoneMm: o.minZoneMm, continuous: { value: continuous.value, deltaT: continuous.deltaT },
    ends: c.ends ?? null,
    steps: steps.map((s, i) => {
      const bands = joint[i]!.tolerances;
      let start = 0;
      const rows = s.layout.fractions.map((f, k): SheetZone => {
        const b = bands[k]!;
        const row: SheetZone = {
          index: k, startMm: start * o.lengthMm, endMm: (start + f) * o.lengthMm, perCm3: b.perCm3, lowPerCm3: b.lowPerCm3, highPerCm3: b.highPerCm3,
          lowAtBound: b.lowAtBound, highAtBound: b.highAtBound, lossAtLow: b.lossAtLow, lossAtHigh: b.lossAtHigh,
          seebeckUvK: room(b.perCm3).seebeck * 1e6, sigmaSCm: room(b.perCm3).sigma / 100,
          // |S| falls and σ rises with doping: the band's high doping gives the low |S| and the high σ.
          seebeckBandUvK: [room(b.highPerCm3).seebeck * 1e6, room(b.lowPerCm3).seebeck * 1e6],
          sigmaBandSCm: [room(b.lowPerCm3).sigma / 100, room(b.highPerCm3).sigma / 100],
        };
        start += f;
        return row;
      });
      return { zones: s.zones, value: s.score.value, deltaT: s.score.deltaT, current: s.score.current, layout: s.layout, rows, joint: joint[i]!.check, yield: yields[i]! };
    }),
  };
}
