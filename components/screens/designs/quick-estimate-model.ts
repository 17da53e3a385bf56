import { CaseError, optimizeLeg, parseCase, type MaterialInput } from '@/shared/engine';
import { designToCase } from '@/shared/runs/design-case';
import type { ValidDesign } from './design-form-model';

/**
 * A quick estimate, computed in the browser before anything is queued: the
 * best uniform leg (one doping, current optimised with it) and, from the
 * same call, a two-node graded leg. A two-node optimisation takes about a
 * tenth of a second; its `baselines.uniform` is exactly the best uniform leg.
 */
export type Estimate = {
  uniform: { perCm3: number | null; current: number; deltaT: number; objective: number };
  /** Doping graded linearly (in log) between two free end values. */
  twoNode: { deltaT: number; objective: number; current: number };
  seconds: number;
};

export type EstimateOutcome = { ok: true; estimate: Estimate } | { ok: false; field: string; message: string };

/** Nodes of the estimate's graded leg: the two ends. */
export const estimateControlPoints = 2;

export function quickEstimate(design: ValidDesign, material: MaterialInput): EstimateOutcome {
  const t0 = Date.now();
  try {
    const c = parseCase(designToCase({ ...design, coldSide: design.coldSide ?? null, controlPoints: estimateControlPoints }, material), 'optimize');
    const r = optimizeLeg(c);
    const u = r.baselines?.uniform;
    const uniform = u
      ? { perCm3: 'perCm3' in u ? u.perCm3 : null, current: u.current, deltaT: u.deltaT, objective: u.objective }
      : { perCm3: null, current: r.current, deltaT: r.deltaT, objective: r.objective.value };
    return {
      ok: true,
      estimate: { uniform, twoNode: { deltaT: r.deltaT, objective: r.objective.value, current: r.current }, seconds: (Date.now() - t0) / 1000 },
    };
  } catch (error) {
    if (!(error instanceof CaseError)) throw error;
    const message = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
    return { ok: false, field: error.field, message };
  }
}
