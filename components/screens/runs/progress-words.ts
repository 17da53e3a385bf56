import type { Objective } from '@/shared/api/designs';
import type { RunProgress } from '@/shared/api/runs';
import { formatObjective, objectiveInfo, quantity } from './run-format';

export type ProgressWords = {
  /** The run's best design so far and the current it runs at: "at 3.86 A"; null when the current is unknown. */
  bestAt: string | null;
  /** The start being searched, with its own best and current: "Start 3 of 16, searching: ΔT 80.5 K at 2.79 A"; null for a one-start search. */
  start: string | null;
};

/**
 * The live numbers in words, each beside the thing it belongs to: the run's
 * best with its own current, the start in progress with its own. (A start's
 * current beside the run's best would describe a design nobody found.)
 */
export function progressWords(objective: Objective, p: RunProgress): ProgressWords {
  const info = objectiveInfo[objective];
  const bestAt = p.bestCurrent === null ? null : `at ${quantity(p.bestCurrent, 'A', 3)}`;
  const s = p.start;
  if (!s || s.of <= 1) return { bestAt, start: null };
  const at = s.current === null ? '' : ` at ${quantity(s.current, 'A', 3)}`;
  return { bestAt, start: `Start ${s.number} of ${s.of}, searching: best ${info.symbol} of this start ${formatObjective(objective, s.best)}${at}` };
}
