import { CaseError, familyFromMaterial, parseCascadeCase, parseCase, parseCoupleCase, parseModuleCase, type MaterialInput } from '../../shared/engine';

/** What a request would store, for the engine to judge: a family definition, a design's cases (one, or one per swept value), a module's, couple's or cascade's resolved case. */
export type EngineCheck = { kind: 'family'; definition: MaterialInput } | { kind: 'cases'; cases: unknown[] } | { kind: 'module'; json: unknown } | { kind: 'couple'; json: unknown } | { kind: 'cascade'; json: unknown };

/** `carrier` of a family; for a refusal, which case (`index`) and field, and the engine's message. */
export type EngineVerdict = { ok: true; carrier: 'p' | 'n' | null } | { ok: false; index: number; field: string; message: string };

const isTable = (material: unknown): boolean => (material as { kind?: unknown } | null | undefined)?.kind === 'table';

/**
 * Whether judging `check` builds a measured table's spline: work that grows
 * with the table (up to a few hundred ms at the size caps). Models and
 * constants are judged in microseconds.
 */
export function buildsTable(check: EngineCheck): boolean {
  if (check.kind === 'family') return isTable(check.definition);
  if (check.kind === 'cases') return check.cases.some((c) => isTable((c as { material?: unknown }).material));
  type Legs = { p?: { material?: unknown }; n?: { material?: unknown } };
  const couples: Legs[] = check.kind === 'cascade' ? ((check.json as { stages?: Legs[] }).stages ?? []) : [check.json as Legs];
  return couples.some((legs) => isTable(legs?.p?.material) || isTable(legs?.n?.material));
}

/** The engine's verdict; errors other than the engine's refusals propagate. */
export function judge(check: EngineCheck): EngineVerdict {
  let index = 0;
  try {
    if (check.kind === 'family') return { ok: true, carrier: familyFromMaterial(check.definition).sign < 0 ? 'n' : 'p' };
    if (check.kind === 'module') parseModuleCase(check.json);
    else if (check.kind === 'couple') parseCoupleCase(check.json);
    else if (check.kind === 'cascade') parseCascadeCase(check.json);
    else for (; index < check.cases.length; index += 1) parseCase(check.cases[index], 'optimize');
    return { ok: true, carrier: null };
  } catch (err) {
    if (err instanceof CaseError) return { ok: false, index, field: err.field, message: err.message };
    throw err;
  }
}
