/** A saved module's curves as CSV, in a worker thread: the engine's root finding takes up to seconds. */
import { answerInThread } from '../threads/run-in-thread';
import { moduleCurvesCsv, type CurvesCsvInput } from './module-curves-csv';

answerInThread((input: CurvesCsvInput) => moduleCurvesCsv(input));
