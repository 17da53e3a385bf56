import type { RunResult } from '@/components/screens/runs/run-result';
import { legsFromRun, parseCurvesCase, runCurves, type LegDefinitionInput, type OperatingCurve, type RunResultLegs } from '@/shared/engine';

export type LegKey = 'optimum' | 'uniform' | 'localBestZt';

export const legLabels: Record<LegKey, string> = {
  optimum: 'Graded optimum',
  uniform: 'Best uniform',
  localBestZt: 'Local-best zT',
};

export type CurveConditionsInput = {
  /** Heat-sink temperature [K]. */
  hotSide: number;
  /** Th − Tc [K]. */
  deltaT: number;
  /** Supply or wire limit [A]; null for none. */
  currentLimit: number | null;
};

/** One leg's curves, or the reason it has none (e.g. it cannot hold that ΔT). */
export type LegCurve = { key: LegKey; label: string; curve: OperatingCurve | null; problem: string | null };

const messageOf = (error: unknown): string => (error instanceof Error ? error.message : String(error));

/** Curves of one leg at the conditions, computed with the engine (temperature-dependent properties). */
export function legCurve(key: LegKey, leg: LegDefinitionInput, conditions: CurveConditionsInput, points = 40): LegCurve {
  const label = legLabels[key];
  try {
    const c = parseCurvesCase({
      ...leg,
      hotSide: conditions.hotSide,
      deltaT: conditions.deltaT,
      points,
      ...(conditions.currentLimit !== null ? { currentLimit: conditions.currentLimit } : {}),
    });
    return { key, label, curve: runCurves(c), problem: null };
  } catch (error) {
    return { key, label, curve: null, problem: messageOf(error) };
  }
}

/** The optimum and both baselines of a stored run at one ΔT (legs the run lacks are left out). */
export function runLegCurves(runCase: unknown, result: RunResultLegs, conditions: CurveConditionsInput): LegCurve[] {
  const legs = legsFromRun(runCase, result);
  const keys: LegKey[] = ['optimum', 'uniform', 'localBestZt'];
  return keys.flatMap((key) => {
    const leg = legs[key];
    return leg ? [legCurve(key, leg, conditions)] : [];
  });
}

/** The legs' part of a stored result as the engine reads it (baselines only when both are known). */
export function resultLegs(result: RunResult): RunResultLegs {
  const b = result.baselines;
  const perCm3 = b?.uniform.perCm3;
  const baselines =
    b && perCm3 !== undefined && b.localBestZt ? { uniform: { ...b.uniform, perCm3 }, localBestZt: b.localBestZt } : null;
  return { doping: result.doping, baselines };
}
