/**
 * The engine's verdict on what a request would store — a family definition,
 * a design's cases (one, or one per swept value), a module's resolved case —
 * in a worker thread: building the spline of a large measured table takes a
 * few hundred milliseconds per case, which the API's event loop owes to
 * other requests.
 */
import { CaseError, familyFromMaterial, parseCase, parseModuleCase, type MaterialInput } from '../../shared/engine';
import { answerInThread } from '../threads/run-in-thread';

export type EngineCheck = { kind: 'family'; definition: MaterialInput } | { kind: 'cases'; cases: unknown[] } | { kind: 'module'; json: unknown };

/** `carrier` of a family; for a refusal, which case (`index`) and field, and the engine's message. */
export type EngineVerdict = { ok: true; carrier: 'p' | 'n' | null } | { ok: false; index: number; field: string; message: string };

function judge(check: EngineCheck, index: { at: number }): 'p' | 'n' | null {
  if (check.kind === 'family') return familyFromMaterial(check.definition).sign < 0 ? 'n' : 'p';
  if (check.kind === 'module') {
    parseModuleCase(check.json);
    return null;
  }
  for (const c of check.cases) {
    parseCase(c, 'optimize');
    index.at += 1;
  }
  return null;
}

answerInThread((check: EngineCheck): EngineVerdict => {
  const index = { at: 0 };
  try {
    return { ok: true, carrier: judge(check, index) };
  } catch (err) {
    if (err instanceof CaseError) return { ok: false, index: index.at, field: err.field, message: err.message };
    throw err;
  }
});
