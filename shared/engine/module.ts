/**
 * Legs, couples and modules as the operating-curve code builds them, and the
 * public calls: operatingCurve (one leg), coupleCurve (p + n), moduleCurve
 * (N couples, plates), moduleDeltaTCurve (versus ΔT) and moduleTrade (the
 * voltage/current trade of splitting a fixed leg area into N couples).
 *
 * A couple is a p-type and an n-type leg electrically in series and
 * thermally in parallel: the same current (each leg's in its own cooling
 * direction, J = sign·I/A), the same junction temperatures. A module is N
 * couples in series: Qc, Qh, V and P are N times a couple's at the same
 * current. Each leg end is a junction with contact resistivity ρc (see
 * leg-profile.ts); the plates sit between all cold junctions and the load,
 * and between all hot junctions and the sink (see device.ts).
 */
import { CaseError } from './case-error';
import { deltaTCurveOf, type DeltaTCurve, type DeltaTOptions } from './delta-t-curve';
import { deviceSolver, type Device } from './device';
import type { LegEnds } from './leg-ends';
import { gradedLeg, segmentedLeg, withEnds, type Leg, type Segment } from './leg-profile';
import type { MaterialFamily } from './material-family';
import { checkConditions, checkCurveOptions, curveOf, flagged, operatingSummary, type CurveConditions, type CurveOptions, type OperatingCurve, type OperatingPoint } from './operating-curve';

/**
 * One leg: geometry, material and contacts. A CheckedCase (parseCase) is one
 * as it stands; parseLegDefinition builds one from JSON.
 */
export type LegDefinition = {
  /** Leg length [m] and cross-section [m²]. */
  length: number;
  area: number;
  /** Constant-property segments from the cold end, or a family with its doping profile (log10 of cm⁻³; none for a constant material). */
  leg: { kind: 'segments'; segments: Segment[] } | { kind: 'family'; family: MaterialFamily; doping?: { x: number[]; log10: number[] } };
  /** Contacts of each junction and parasitic heat onto the leg; @default ideal */
  ends?: LegEnds;
};

export type CoupleDefinition = { p: LegDefinition; n: LegDefinition };

export type ModuleDefinition = CoupleDefinition & {
  /**
   * Couples in series.
   * @default 1
   */
  couples?: number;
  /** Thermal resistance of the cold plate, load to cold junctions, per module [K/W]; @default 0 */
  coldPlateResistance?: number;
  /** Thermal resistance of the hot plate, hot junctions to sink, per module [K/W]; @default 0 */
  hotPlateResistance?: number;
};

export type TradeOptions = {
  /** Couple counts to compare at the module's total leg area; default: a ladder from 1 to beyond the module's N, and N itself. */
  couples?: number[];
  currentLimit?: number;
  /** @default 1e-9 */
  tolerance?: number;
};

export type TradeRow = {
  couples: number;
  /** Leg cross-sections [m²] at this split of the total leg area. */
  legArea: { p: number; n: number };
  pumpingRange: [number, number];
  maxHeatLoad: OperatingPoint;
  maxCop: OperatingPoint | null;
};

export type ModuleTrade = {
  hotSide: number;
  coldSide: number;
  deltaT: number;
  /** N·(A_p + A_n) [m²], the same in every row. */
  totalLegArea: number;
  rows: TradeRow[];
  currentLimit: number | null;
  evaluations: number;
};

/** The engine's leg for a definition (contacts included). */
export function legFromDefinition(d: LegDefinition, field = ''): Leg {
  const at = (name: string) => (field ? `${field}.${name}` : name);
  if (!(d.length > 0 && Number.isFinite(d.length))) throw new CaseError(at('length'), 'must be a length in metres, greater than 0');
  if (!(d.area > 0 && Number.isFinite(d.area))) throw new CaseError(at('area'), 'must be an area in m², greater than 0');
  const contacts = d.ends?.contacts;
  for (const end of ['cold', 'hot'] as const) {
    const v = contacts?.[end] ?? 0;
    if (!(v >= 0 && Number.isFinite(v))) throw new CaseError(at(`contactResistivity.${end}`), 'must be 0 or more (Ω·m²)');
  }
  if (d.leg.kind === 'segments') return withEnds(segmentedLeg(d.length, d.area, d.leg.segments), d.ends);
  const family = d.leg.family;
  if (!d.leg.doping && family.kind !== 'constant') throw new CaseError(at('doping'), 'is required for a table or band material: a number (cm⁻³) or {x, perCm3}');
  const doping = d.leg.doping ?? { x: [0, 1], log10: [0, 0] };
  return withEnds(gradedLeg(d.length, d.area, family, doping.x, doping.log10), d.ends);
}

const materialField = (d: LegDefinition, side: 'p' | 'n') => `${side}.${d.leg.kind === 'segments' ? 'segments' : 'material'}`;

function checkedModule(m: ModuleDefinition): { device: Device; couples: number; p: Leg; n: Leg } {
  const couples = m.couples ?? 1;
  if (!Number.isInteger(couples) || couples < 1) throw new CaseError('couples', 'must be a whole number, 1 or more');
  const coldPlateResistance = m.coldPlateResistance ?? 0;
  const hotPlateResistance = m.hotPlateResistance ?? 0;
  if (!(coldPlateResistance >= 0 && Number.isFinite(coldPlateResistance))) throw new CaseError('coldPlateResistance', 'must be 0 or more (K/W)');
  if (!(hotPlateResistance >= 0 && Number.isFinite(hotPlateResistance))) throw new CaseError('hotPlateResistance', 'must be 0 or more (K/W)');
  const p = legFromDefinition(m.p, 'p');
  const n = legFromDefinition(m.n, 'n');
  if (p.sign !== 1) throw new CaseError(materialField(m.p, 'p'), 'the p leg must be p-type (positive Seebeck coefficient)');
  if (n.sign !== -1) throw new CaseError(materialField(m.n, 'n'), 'the n leg must be n-type (negative Seebeck coefficient)');
  return {
    device: { legs: [{ leg: p, count: couples }, { leg: n, count: couples }], coldPlateResistance, hotPlateResistance },
    couples,
    p,
    n,
  };
}

/** Qc, Qh, V, P and COP of one leg versus current at fixed Tc and Th; the currents of maximum Qc and COP. */
export function operatingCurve(leg: LegDefinition, conditions: CurveConditions, options: CurveOptions = {}): OperatingCurve {
  const { tolerance } = checkCurveOptions(options);
  const device: Device = { legs: [{ leg: legFromDefinition(leg), count: 1 }], coldPlateResistance: 0, hotPlateResistance: 0 };
  return curveOf(deviceSolver(device, tolerance), conditions, options, 'the leg');
}

/** The same for one couple (p + n leg, no plates). */
export function coupleCurve(couple: CoupleDefinition, conditions: CurveConditions, options: CurveOptions = {}): OperatingCurve {
  return moduleCurve({ p: couple.p, n: couple.n, couples: 1 }, conditions, options);
}

/** The same for a module of N couples behind its plates: load at coldSide, sink at hotSide. */
export function moduleCurve(module: ModuleDefinition, conditions: CurveConditions, options: CurveOptions = {}): OperatingCurve {
  const { tolerance } = checkCurveOptions(options);
  const { device, couples } = checkedModule(module);
  return curveOf(deviceSolver(device, tolerance), conditions, options, couples === 1 ? 'the couple' : 'the module');
}

/** The module versus ΔT (sink at hotSide) up to its largest ΔT, at a fixed current or at each ΔT's current of maximum Qc. */
export function moduleDeltaTCurve(module: ModuleDefinition, conditions: { hotSide: number }, options: DeltaTOptions & { tolerance?: number } = {}): DeltaTCurve {
  const { tolerance } = checkCurveOptions({ tolerance: options.tolerance, currentLimit: options.currentLimit });
  if (!(Number.isFinite(conditions.hotSide) && conditions.hotSide > 0)) throw new CaseError('hotSide', 'must be a temperature in kelvin, greater than 0');
  const { device, couples } = checkedModule(module);
  return deltaTCurveOf(deviceSolver(device, tolerance), conditions.hotSide, options, couples === 1 ? 'the couple' : 'the module');
}

const LADDER = [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000];

/** Default couple counts for the trade: the ladder up to 4N (at least 10), plus N. */
export function defaultTradeCouples(couples: number): number[] {
  const top = Math.max(10, 4 * couples);
  return [...new Set([...LADDER.filter((v) => v <= top), couples])].sort((a, b) => a - b);
}

/**
 * The module's total leg area N·(A_p + A_n) split into N' couples for each
 * N' (leg areas × N/N'), each solved in full at the same load and sink
 * temperatures: current and voltage of maximum Qc and of maximum COP. In
 * this model I·N' and V/N' stay fixed and Qc, COP are the same (equal
 * current density in every leg); the flags show which splits a supply can drive.
 */
export function moduleTrade(module: ModuleDefinition, conditions: CurveConditions, options: TradeOptions = {}): ModuleTrade {
  const c = checkConditions(conditions);
  const { tolerance, currentLimit } = checkCurveOptions({ tolerance: options.tolerance, currentLimit: options.currentLimit });
  const base = checkedModule(module);
  const list = options.couples ?? defaultTradeCouples(base.couples);
  if (list.length === 0 || list.length > 50) throw new CaseError('tradeCouples', 'give 1 to 50 couple counts');
  list.forEach((v, k) => {
    if (!Number.isInteger(v) || v < 1 || v > 1e5) throw new CaseError(`tradeCouples[${k}]`, 'must be a whole number from 1 to 100000');
  });
  let evaluations = 0;
  const rows = list.map((couples): TradeRow => {
    const scale = base.couples / couples;
    const scaled: ModuleDefinition = { ...module, couples, p: { ...module.p, area: module.p.area * scale }, n: { ...module.n, area: module.n.area * scale } };
    const solver = deviceSolver(checkedModule(scaled).device, tolerance);
    const s = operatingSummary(solver, c, couples === 1 ? 'one couple' : `${couples} couples`);
    evaluations += solver.evaluations();
    return {
      couples,
      legArea: { p: scaled.p.area, n: scaled.n.area },
      pumpingRange: s.pumpingRange,
      maxHeatLoad: flagged(s.maxHeatLoad, currentLimit),
      maxCop: s.maxCop && flagged(s.maxCop, currentLimit),
    };
  });
  return {
    hotSide: c.hotSide,
    coldSide: c.coldSide,
    deltaT: c.deltaT,
    totalLegArea: base.couples * (module.p.area + module.n.area),
    rows,
    currentLimit,
    evaluations,
  };
}
