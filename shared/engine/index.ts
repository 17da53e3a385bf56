/**
 * Frostgrade's leg engine: the public API the worker, the API and the client
 * call. Pure TypeScript, SI inside (doping in cm⁻³ and mobility in
 * cm²/(V·s) at the case boundary only).
 *
 *   const c = parseCase(json, 'optimize');          // throws CaseError{field, message}
 *   const result = optimizeLeg(c, {
 *     onProgress: (p) => report(p),                  // after each baseline and iteration; p.state is a checkpoint
 *     shouldStop: () => job.signal.aborted,          // checked between iterations; the best so far is returned
 *     start: checkpoint,                             // resume from a saved p.state / result.state
 *   });
 *   const solution = solveLeg(parseCase(json, 'solve'));
 *
 * Physics, numerics and the case format: PHYSICS.md beside this file.
 */
export { CaseError } from './case-error';
export { parseCase, familyFromMaterial, fieldPath, DEFAULT_CONTROL_POINTS, MIN_PER_CM3, MAX_PER_CM3 } from './check-case';
export type { CheckedCase, CheckedLeg, Mode } from './check-case';
export { caseSchema, materialSchema, segmentSchema, tableRowSchema, dopingSchema } from './case-schema';
export type { CaseInput, MaterialInput } from './case-schema';
export { solveLeg, optimizeLeg } from './run-case';
export type { CaseSolution, OptimizeResult, OptimizeOptions, OptimizeProgress, OptimizerState, BaselineReport, SegmentBaselineReport } from './run-case';
export type { LegProfile, SolveOptions } from './solve-leg';
export type { NodeSensitivity } from './sensitivity';
export type { Objective } from './evaluate-design';
export type { Segment } from './leg-profile';
export type { MaterialFamily, Properties } from './material-family';
export { figureOfMerit } from './material-family';
export { propertiesAt, ztOptimalDoping } from './family-helpers';
export type { LocalProperties } from './family-helpers';
export type { BandParameters } from './band-model';
