import { parseCase, propertiesAt } from '../engine';
import type { Objective } from '../engine';
import { zoneTolerances } from './zone-tolerance';
import { problemOf, zoneProfile } from './zoning';
import type { ZoneLayout } from './zoned-leg';

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

export type SheetStep = { zones: number; value: number; deltaT: number; current: number; layout: ZoneLayout; rows: SheetZone[] };

export type GrowthSheet = {
  objective: Objective;
  /** Unit of `value` and of the loss budget. */
  unit: 'K' | 'W' | '';
  lossBudget: number;
  measureTemperature: number;
  lengthMm: number;
  minZoneMm: number;
  continuous: { value: number; deltaT: number };
  steps: SheetStep[];
};

export type SheetOptions = { lengthMm: number; minZoneMm: number; maxZones: number; lossBudget: number; measureTemperature: number; shouldStop?: () => boolean };

const unitOf = (o: Objective): GrowthSheet['unit'] => (o === 'maxDeltaT' ? 'K' : o === 'maxHeatLoad' ? 'W' : '');

/**
 * The growth sheet of a converged run: for K = 1…maxZones, the zones that
 * lose the least against the continuous profile, each with its tolerance
 * band and the room-temperature S and σ the grower can check.
 */
export function buildGrowthSheet(caseJson: unknown, continuous: { x: number[]; perCm3: number[]; value: number; deltaT: number }, o: SheetOptions): GrowthSheet {
  const c = parseCase(caseJson, 'optimize');
  if (c.leg.kind !== 'family') throw new Error('a growth sheet needs a doping-controlled family');
  const family = c.leg.family;
  const p = problemOf(c, 1e-8);
  // Never ask for zones shorter than the grower's minimum, nor more than fit.
  const minFraction = Math.min(o.minZoneMm / o.lengthMm, 1);
  const maxZones = Math.max(1, Math.min(o.maxZones, minFraction > 0 ? Math.floor(1 / minFraction + 1e-9) : o.maxZones));
  const steps = zoneProfile(c, { maxZones, minZoneFraction: minFraction, continuous: { x: continuous.x, log10: continuous.perCm3.map(Math.log10) }, shouldStop: o.shouldStop });
  const room = (n: number) => propertiesAt(family, n, o.measureTemperature);
  return {
    objective: c.objective, unit: unitOf(c.objective), lossBudget: o.lossBudget, measureTemperature: o.measureTemperature,
    lengthMm: o.lengthMm, minZoneMm: o.minZoneMm, continuous: { value: continuous.value, deltaT: continuous.deltaT },
    steps: steps.map((s) => {
      const bands = zoneTolerances(p, s.layout, s.score, o.lossBudget);
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
      return { zones: s.zones, value: s.score.value, deltaT: s.score.deltaT, current: s.score.current, layout: s.layout, rows };
    }),
  };
}
