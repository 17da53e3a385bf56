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
 *   // Operating curves, couples and modules (pure, synchronous, tens of ms):
 *   const curve = operatingCurve(parseLegDefinition(legJson, 300), { hotSide: 300, deltaT: 40 }, { points: 40, currentLimit: 6 });
 *   const m = { p, n, couples: 31, coldPlateResistance: 0.1, hotPlateResistance: 0.05 };
 *   moduleCurve(m, { hotSide: 300, coldSide: 260 });   // versus current
 *   moduleDeltaTCurve(m, { hotSide: 300 });             // versus ΔT at each ΔT's current of maximum Qc
 *   moduleTrade(m, { hotSide: 300, deltaT: 40 });       // the same leg area as 1, 2, 5, … couples
 *
 *   // A matched couple: both profiles, the shared current and A_n/A_p together (seconds; a worker's job):
 *   const couple = runCouple(parseCoupleCase(json), { onProgress, shouldStop });   // multi-start: coupleSearch (shared/runs)
 *
 * Physics, numerics and the case format: PHYSICS.md beside this file.
 */
export { CaseError } from './case-error';
export { parseCase, familyFromMaterial, fieldPath, DEFAULT_CONTROL_POINTS, MIN_PER_CM3, MAX_PER_CM3 } from './check-case';
export type { CheckedCase, CheckedLeg, Mode } from './check-case';
export { caseSchema, materialSchema, segmentSchema, tableRowSchema, dopingSchema, minorityBandSchema, GAP_OPEN_TO } from './case-schema';
export type { CaseInput, MaterialInput, MinorityBandInput } from './case-schema';
export { solveLeg, optimizeLeg, dopingBaselines } from './run-case';
export type { CaseSolution, OptimizeResult, OptimizeOptions, OptimizeProgress, OptimizerState, BaselineReport, SegmentBaselineReport, DopingBaselines } from './run-case';
export type { LegProfile, SolveOptions } from './solve-leg';
export type { NodeSensitivity } from './sensitivity';
export type { Objective } from './evaluate-design';
export type { Segment } from './leg-profile';
export type { MaterialFamily, Properties } from './material-family';
export { figureOfMerit } from './material-family';
export { propertiesAt, ztOptimalDoping } from './family-helpers';
export type { LocalProperties } from './family-helpers';
export type { BandParameters, MinorityBand } from './band-model';
export { BIPOLAR_SHARE, bipolarOfProfile, largestMinorityShare } from './bipolar';
export type { BipolarPoint, ProfileLike } from './bipolar';
export { withEnds } from './leg-profile';
export type { Leg } from './leg-profile';
export { contactResistivitySchema, parasiticSchema, legEndsOf, legEndsOfCase, perimeterOf } from './leg-ends';
export type { Contacts, Parasitic, LegEnds, ContactResistivityInput, ParasiticInput } from './leg-ends';
export { operatingCurve, coupleCurve, moduleCurve, moduleDeltaTCurve, moduleTrade, legFromDefinition, defaultTradeCouples } from './module';
export type { LegDefinition, CoupleDefinition, ModuleDefinition, TradeOptions, TradeRow, ModuleTrade } from './module';
export { DEFAULT_CURVE_POINTS } from './operating-curve';
export type { CurveConditions, CurveOptions, CurveSamples, OperatingCurve, OperatingPoint } from './operating-curve';
export { DEFAULT_DELTA_T_POINTS } from './delta-t-curve';
export type { DeltaTCurve, DeltaTMode, DeltaTOptions } from './delta-t-curve';
export type { DevicePoint } from './device';
export { legDefinitionSchema, moduleLegSchema, curvesCaseSchema, moduleCaseSchema, parseLegDefinition, parseCurvesCase, parseModuleCase } from './device-case';
export type { LegDefinitionInput, CurvesCaseInput, ModuleCaseInput, CurvesCase, ModuleCase } from './device-case';
export { runCurves, runModule } from './run-device-case';
export type { CurvesResult, ModuleResult } from './run-device-case';
export { legsFromRun } from './run-legs';
export type { RunLegs, RunResultLegs } from './run-legs';
export { cascadeAt, cascadeSolver } from './cascade';
export type { CascadeDefinition, CascadeStage, CascadeCold, CascadePoint, CascadeStagePoint, CascadeSolver } from './cascade';
export { cascadeCaseSchema, parseCascadeCase, MAX_STAGES, DEFAULT_CASCADE_CURVE_POINTS } from './cascade-case';
export type { CascadeCaseInput, CheckedCascadeCase, CouplesLimit } from './cascade-case';
export { optimizeCascade } from './optimize-cascade';
export type { CascadeStart, CascadeProgress, CascadeOptimizeOptions, CascadeOptimum } from './optimize-cascade';
export { runCascade } from './run-cascade-case';
export type { CascadeResult, CascadeStageResult, CascadeCurve, CascadeCurvePoint } from './run-cascade-case';
export { coupleCaseSchema, parseCoupleCase, AREA_RATIO_BOUNDS } from './couple-case';
export type { CheckedCoupleCase, CoupleCaseInput, CoupleLegCase } from './couple-case';
export { runCouple } from './run-couple-case';
export type { CoupleResult, CoupleLegResult, CoupleOptions } from './run-couple-case';
export type { CoupleState, CoupleProgress } from './optimize-couple';
