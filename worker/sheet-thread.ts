/**
 * Builds a growth sheet in a worker thread: zoning for every K takes
 * seconds of CPU, and the worker's event loop must keep beating meanwhile.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { buildGrowthSheet, type SheetOptions } from '../shared/growth/growth-sheet';

type Input = { caseJson: unknown; continuous: { x: number[]; perCm3: number[]; value: number; deltaT: number }; options: SheetOptions };
const input = workerData as Input;
try {
  parentPort!.postMessage({ ok: true, sheet: buildGrowthSheet(input.caseJson, input.continuous, input.options) });
} catch (err) {
  parentPort!.postMessage({ ok: false, message: err instanceof Error ? err.message : String(err) });
}
