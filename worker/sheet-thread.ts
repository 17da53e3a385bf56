/**
 * Builds a growth sheet in a worker thread: zoning for every K, the joint
 * bands and the yields take seconds of CPU, and the worker's event loop must
 * keep beating meanwhile. `yieldOnly` recomputes just the yields of a stored
 * sheet at a new doping scatter.
 */
import { answerInThread, reportProgress } from '../server/threads/run-in-thread';
import { buildGrowthSheet, withYields, type GrowthSheet, type SheetOptions } from '../shared/growth/growth-sheet';

export type SheetThreadInput =
  | { kind: 'sheet'; caseJson: unknown; continuous: { x: number[]; perCm3: number[]; value: number; deltaT: number }; options: SheetOptions }
  | { kind: 'yield'; caseJson: unknown; sheet: GrowthSheet; dopingScatter: number };

/** Progress a few times a second at most: every message wakes the worker's event loop. */
function throttled(): (fraction: number) => void {
  let last = 0;
  return (fraction) => {
    const now = Date.now();
    if (now - last < 250 && fraction < 1) return;
    last = now;
    reportProgress(fraction);
  };
}

answerInThread((input: SheetThreadInput): GrowthSheet =>
  input.kind === 'yield'
    ? withYields(input.caseJson, input.sheet, input.dopingScatter, { onProgress: throttled() })
    : buildGrowthSheet(input.caseJson, input.continuous, { ...input.options, onProgress: throttled() }));
