/** A saved module's curves as CSV, in a worker thread: the engine's root finding takes up to seconds. */
import { moduleCurvesCsv, type CurvesCsvInput } from './module-curves-csv';

/** Run by the API's thread pool (server/services/api-threads.ts). */
export default function curvesCsv(input: CurvesCsvInput): ReturnType<typeof moduleCurvesCsv> {
  return moduleCurvesCsv(input);
}
