import { cascadeResultSchema, coolerSchema, coolerSearchSchema, coupleResultSchema, type CascadeRunResult, type Cooler as CoolerDto, type CoupleRunResult } from '../api';

/**
 * A couple or cascade run's stored result read through the contract's
 * schemas (shared/api/coolers.ts): the engine's output plus the search.
 * A result that does not parse is treated as absent rather than shown
 * half-read. Pure: the API, the worker's mail and the CSV read it alike.
 */
const stored = {
  couple: coupleResultSchema.extend({ search: coolerSearchSchema.optional() }),
  cascade: cascadeResultSchema.extend({ search: coolerSearchSchema.optional() }),
};

export type StoredCoupleResult = CoupleRunResult & { search?: { startsDone: number; bestStart: number; starts: number } };
export type StoredCascadeResult = CascadeRunResult & { search?: { startsDone: number; bestStart: number; starts: number } };
export type StoredCoolerResult = { kind: 'couple'; result: StoredCoupleResult } | { kind: 'cascade'; result: StoredCascadeResult };

export function coolerResultOf(kind: string, result: unknown): StoredCoolerResult | null {
  if (result === null || result === undefined || (kind !== 'couple' && kind !== 'cascade')) return null;
  const parsed = stored[kind].safeParse(result);
  if (!parsed.success) return null;
  return kind === 'couple' ? { kind, result: parsed.data as StoredCoupleResult } : { kind, result: parsed.data as StoredCascadeResult };
}

/**
 * The headline of a cooler result, as run summaries show it. A couple's
 * `best` is its objective (ΔT [K], heat load [W] or COP); a cascade's `best`
 * is what its objective optimised: ΔT [K] for maxDeltaT, the total input
 * power [W] for minPower (least is best there, unlike every other `best`).
 */
export function coolerHeadline(r: StoredCoolerResult): { best: number; deltaT: number; power: number } {
  if (r.kind === 'couple') return { best: r.result.objective.value, deltaT: r.result.deltaT, power: r.result.power };
  const c = r.result;
  return { best: c.objective === 'minPower' ? c.power : c.deltaT, deltaT: c.deltaT, power: c.power };
}

/** The frozen cooler of a run (its snapshot), read through the contract; null for a leg run. */
export function coolerSnapshotOf(snapshot: unknown): CoolerDto | null {
  const parsed = coolerSchema.safeParse(snapshot);
  return parsed.success ? parsed.data : null;
}
