import { CaseError, parseCase, solveLeg } from '@/shared/engine';
import type { LegProfileData, RunResult } from './run-result';

export type BaselineProfiles = {
  uniform: LegProfileData | null;
  localBestZt: LegProfileData | null;
  /** Why a baseline could not be drawn along the leg, if one could not. */
  note?: string;
};

type Doping = number | { x: number[]; perCm3: number[] };

/** The run's case solved for one baseline's doping and current, under the same end conditions. */
function solveBaseline(runCase: Record<string, unknown>, doping: Doping, current: number): LegProfileData {
  const { objective, bounds: _b, controlPoints: _c, monotone: _m, coldSide, heatLoad, ...leg } = runCase;
  const conditions = objective === 'maxHeatLoad' ? { coldSide } : { heatLoad: typeof heatLoad === 'number' ? heatLoad : 0 };
  return solveLeg(parseCase({ ...leg, ...conditions, doping, current }, 'solve')).profile;
}

/**
 * The two baselines' profiles along the leg, solved in the browser: the
 * stored result has their doping and current but not their temperature and
 * properties, and one solve takes well under a millisecond.
 */
export function baselineProfiles(runCase: Record<string, unknown>, result: RunResult): BaselineProfiles {
  const b = result.baselines;
  if (!b) return { uniform: null, localBestZt: null };
  const notes: string[] = [];
  const attempt = (name: string, f: () => LegProfileData): LegProfileData | null => {
    try {
      return f();
    } catch (error) {
      if (!(error instanceof CaseError)) throw error;
      notes.push(`${name}: ${error.message}`);
      return null;
    }
  };
  const perCm3 = b.uniform.perCm3;
  const uniform = perCm3 === undefined ? null : attempt('best uniform leg', () => solveBaseline(runCase, perCm3, b.uniform.current));
  const local = b.localBestZt;
  const localBestZt = local ? attempt('local-best-zT leg', () => solveBaseline(runCase, local.doping, local.current)) : null;
  return { uniform, localBestZt, ...(notes.length > 0 ? { note: `Not drawn: ${notes.join('; ')}` } : {}) };
}
