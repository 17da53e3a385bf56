import { cascadeResultSchema, coolerSearchSchema, coupleResultSchema, type CascadeRunResult, type CoupleRunResult } from '@/shared/api/coolers';
import type { RunKind } from '@/shared/api/runs';

export type CoolerSearch = { startsDone: number; bestStart: number; starts: number };

export type ParsedCoolerResult =
  | { ok: true; kind: 'cascade'; result: CascadeRunResult; search: CoolerSearch | null }
  | { ok: true; kind: 'couple'; result: CoupleRunResult; search: CoolerSearch | null }
  | { ok: false; message: string }
  | null;

/**
 * A couple or cascade run's stored result (an open record in the API),
 * read through the contract's schema for its kind: a change in the
 * engine's output is a clear message, not a broken page. Null: no result yet.
 */
export function parseCoolerResult(kind: RunKind, raw: Record<string, unknown> | null): ParsedCoolerResult {
  if (raw === null) return null;
  const search = coolerSearchSchema.safeParse(raw.search);
  const schema = kind === 'couple' ? coupleResultSchema : cascadeResultSchema;
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, message: `The stored result has an unexpected shape at ${issue?.path.join('.') || 'its top level'}: ${issue?.message ?? 'unknown'}` };
  }
  const s = search.success ? search.data : null;
  return kind === 'couple' ? { ok: true, kind: 'couple', result: parsed.data as CoupleRunResult, search: s } : { ok: true, kind: 'cascade', result: parsed.data as CascadeRunResult, search: s };
}
