/**
 * Builds a growth sheet in a worker thread: zoning for every K takes
 * seconds of CPU, and the worker's event loop must keep beating meanwhile.
 */
import { answerInThread } from '../server/threads/run-in-thread';
import { buildGrowthSheet, type SheetOptions } from '../shared/growth/growth-sheet';

export type SheetThreadInput = { caseJson: unknown; continuous: { x: number[]; perCm3: number[]; value: number; deltaT: number }; options: SheetOptions };

answerInThread((input: SheetThreadInput) => buildGrowthSheet(input.caseJson, input.continuous, input.options));
