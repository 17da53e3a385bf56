import type { RunProgress } from '../api/runs';
import type { SearchProgress } from './global-search';

/**
 * The `run:progress` payload of one search report. The run's best and the
 * current it holds travel together (`best`, `bestCurrent`); the start being
 * searched has its own best and current (`start`), so a screen never puts one
 * start's current beside another start's best.
 */
export function runProgressOf(runId: string, p: SearchProgress, elapsedSeconds: number, at: Date): RunProgress {
  const doping = p.state?.kind === 'doping' ? { x: p.state.perCm3.map((_, i, a) => i / (a.length - 1)), perCm3: p.state.perCm3 } : null;
  return {
    runId, phase: `${p.phase} · start ${p.start + 1} of ${p.starts}`, iteration: p.iteration, objective: p.objective,
    best: p.best, bestCurrent: p.bestCurrent,
    start: { number: p.start + 1, of: p.starts, best: p.startBest, current: p.state?.current ?? null },
    doping, fractionDone: p.fractionDone, evaluations: p.evaluations, elapsedSeconds, at: at.toISOString(),
  };
}
