/**
 * The legs of a stored run, as leg definitions for curves and modules: the
 * optimum and its two baselines (best uniform doping, local-best-zT
 * profile), each with the run's geometry, material, contacts and parasitic heat.
 */
import { CaseError } from './case-error';
import { caseSchema } from './case-schema';
import { fieldPath } from './check-case';
import type { LegDefinitionInput } from './device-case';
import type { OptimizeResult } from './run-case';

export type RunLegs = {
  /** The optimised leg (a constant-material run: the case's leg itself). */
  optimum: LegDefinitionInput;
  /** The best uniform doping (or, for segments, the best single segment); null when the run has no baselines. */
  uniform: LegDefinitionInput | null;
  /** The local-best-zT profile; null when the run has none (segments, constant material). */
  localBestZt: LegDefinitionInput | null;
};

/** The parts of a run's result the legs come from (an OptimizeResult has them). */
export type RunResultLegs = Pick<OptimizeResult, 'doping' | 'segments' | 'baselines'>;

/** Leg definitions of a run: the engine case exactly as run, and its result. */
export function legsFromRun(runCase: unknown, result: RunResultLegs): RunLegs {
  const parsed = caseSchema.safeParse(runCase);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new CaseError(`case.${fieldPath(issue.path)}`, issue.message);
  }
  const c = parsed.data;
  const base = { length: c.length, area: c.area, ...(c.contactResistivity !== undefined ? { contactResistivity: c.contactResistivity } : {}), ...(c.parasitic ? { parasitic: c.parasitic } : {}) };
  const b = result.baselines;
  if (c.segments) {
    const segments = c.segments;
    const single = b && 'segment' in b.uniform ? segments[b.uniform.segment] : undefined;
    return {
      optimum: { ...base, segments: result.segments ?? segments },
      uniform: single ? { ...base, segments: [{ ...single, fraction: 1 }] } : null,
      localBestZt: null,
    };
  }
  if (!c.material) throw new CaseError('case.material', 'the run has neither a material nor segments');
  const material = c.material;
  if (material.kind === 'constant') return { optimum: { ...base, material }, uniform: null, localBestZt: null };
  const doping = result.doping ?? c.doping;
  if (doping === undefined) throw new CaseError('result.doping', 'the run has no doping profile yet');
  const uniform = b && 'perCm3' in b.uniform ? b.uniform.perCm3 : undefined;
  const local = b?.localBestZt ?? null;
  return {
    optimum: { ...base, material, doping },
    uniform: uniform !== undefined ? { ...base, material, doping: uniform } : null,
    localBestZt: local ? { ...base, material, doping: local.doping } : null,
  };
}
