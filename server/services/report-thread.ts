/**
 * Reads as-grown measurements and predicts how the leg cools, in a worker
 * thread: parsing a file of up to 5 MB, inverting every point and re-solving
 * the leg take tens to hundreds of milliseconds, which the API's event loop
 * owes to other requests.
 */
import type { UploadIssue } from '../../shared/api';
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { reportMeasurements, type MeasurementReport } from '../../shared/growth/measurement-report';
import { parseMeasurementsCsv, type MeasuredPoint } from '../../shared/growth/parse-measurements';

export type ReportThreadInput = { text: string; caseJson: unknown; sheet: GrowthSheet; zones: number; temperature: number; /** r_H entered on the upload. */ hallFactor?: number };

/** The file's errors (nothing is predicted), or the points read, the warnings about them and the prediction. */
export type ReportThreadAnswer = { errors: UploadIssue[] } | { points: MeasuredPoint[]; warnings: UploadIssue[]; report: MeasurementReport };

/** Run by the API's thread pool (server/services/api-threads.ts). */
export default function readAndPredict(i: ReportThreadInput): ReportThreadAnswer {
  const parsed = parseMeasurementsCsv(i.text, i.sheet.lengthMm);
  if (!parsed.ok) return { errors: parsed.errors };
  return { points: parsed.points, warnings: parsed.warnings, report: reportMeasurements(i.caseJson, i.sheet, i.zones, parsed.points, i.temperature, { hallFactor: i.hallFactor }) };
}
