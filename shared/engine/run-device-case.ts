/**
 * What `leg curves FILE` and `leg module FILE` print: a checked case in, one
 * result object out (pure; time is read only to report `seconds`).
 */
import { moduleDeltaTCurve, moduleCurve, moduleTrade, operatingCurve, type ModuleTrade } from './module';
import type { CurvesCase, ModuleCase } from './device-case';
import type { DeltaTCurve } from './delta-t-curve';
import type { Contacts } from './leg-ends';
import type { OperatingCurve } from './operating-curve';

export type CurvesResult = OperatingCurve & { seconds: number };

export type ModuleResult = {
  module: {
    couples: number;
    /** Leg cross-sections [m²] and A_n / A_p. */
    legArea: { p: number; n: number };
    areaRatio: number;
    /** N·(A_p + A_n) [m²]. */
    totalLegArea: number;
    /** Each leg's cold and hot junction [Ω·m²]. */
    contactResistivity: { p: Contacts; n: Contacts };
    coldPlateResistance: number;
    hotPlateResistance: number;
  };
  /** Versus current at the case's ΔT (load at coldSide, sink at hotSide). */
  versusCurrent: OperatingCurve;
  /** Versus ΔT (sink at hotSide), at deltaTCurrent or at each ΔT's current of maximum Qc. */
  versusDeltaT: DeltaTCurve;
  /** The same total leg area split into other numbers of couples. */
  trade: ModuleTrade;
  seconds: number;
};

const clock = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

export function runCurves(c: CurvesCase, now: () => number = clock): CurvesResult {
  const t0 = now();
  const curve = operatingCurve(c.leg, c.conditions, c.options);
  return { ...curve, seconds: (now() - t0) / 1000 };
}

export function runModule(c: ModuleCase, now: () => number = clock): ModuleResult {
  const t0 = now();
  const m = c.module;
  const couples = m.couples ?? 1;
  const versusCurrent = moduleCurve(m, c.conditions, c.options);
  const versusDeltaT = moduleDeltaTCurve(m, { hotSide: c.conditions.hotSide }, c.deltaT);
  const trade = moduleTrade(m, c.conditions, c.trade);
  return {
    module: {
      couples,
      legArea: { p: m.p.area, n: m.n.area },
      areaRatio: c.areaRatio,
      totalLegArea: couples * (m.p.area + m.n.area),
      contactResistivity: { p: m.p.ends?.contacts ?? { cold: 0, hot: 0 }, n: m.n.ends?.contacts ?? { cold: 0, hot: 0 } },
      coldPlateResistance: m.coldPlateResistance ?? 0,
      hotPlateResistance: m.hotPlateResistance ?? 0,
    },
    versusCurrent,
    versusDeltaT,
    trade,
    seconds: (now() - t0) / 1000,
  };
}
