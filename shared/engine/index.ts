/**
 * Frostgrade's leg engine: the public API the worker, the API and the client
 * call. Pure TypeScript, SI inside (doping in cm⁻³ and mobility in
 * cm²/(V·s) at the case boundary only).
 *
 *   const c = parseCase(json, 'optimize');          // throws CaseError{field, message}
 *   const result = optimizeLeg(c, { onProgress, shouldStop, start });
 *   const solution = solveLeg(parseCase(json, 'solve'));
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
