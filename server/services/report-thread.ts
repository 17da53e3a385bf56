/**
 * Predicts how an as-grown leg cools from its measurements, in a worker
 * thread: inverting every point and re-solving the leg takes tens to hundreds
 * of milliseconds, which the API's event loop owes to other requests.
 */
import type { GrowthSheet } from '../../shared/growth/growth-sheet';
import { reportMeasurements } from '../../shared/growth/measurement-report';
import type { MeasuredPoint } from '../../shared/growth/parse-measurements';
import { answerInThread } from '../threads/run-in-thread';

export type ReportThreadInput = { caseJson: unknown; sheet: GrowthSheet; zones: number; points: MeasuredPoint[]; temperature: number };

answerInThread((i: ReportThreadInput) => reportMeasurements(i.caseJson, i.sheet, i.zones, i.points, i.temperature));
