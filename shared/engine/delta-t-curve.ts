/**
 * A device versus ΔT with the sink at a fixed temperature: from ΔT = 0 to
 * the largest ΔT (where Qc reaches 0), either at one fixed current or at the
 * current of maximum Qc for each ΔT.
 *
 * - At a fixed current I the end is ΔT₀(I): the cold side with Qc = 0 at I
 *   (one junction solve with the heat load given).
 * - At the current of maximum Qc the end is ΔTmax: the largest ΔT at Qc = 0
 *   over all currents (Brent's minimiser on −ΔT(I)); at every intermediate
 *   ΔT the current of maximum Qc is found by Brent's minimiser again.
 */
import { CaseError } from './case-error';
import type { DevicePoint, DeviceSolver } from './device';
import { maxDeltaTPoint, maxHeatLoadPoint } from './device-optima';
import { flagged, type CurveSamples, type OperatingPoint } from './operating-curve';

export type DeltaTMode = 'fixedCurrent' | 'maxHeatLoadCurrent';

export type DeltaTCurve = CurveSamples & {
  /** Which current each point is at: the given one, or that ΔT's current of maximum Qc. */
  mode: DeltaTMode;
  hotSide: number;
  /** The end of the curve: the largest ΔT [K] (Qc = 0) and the device there. */
  deltaTMax: OperatingPoint;
  /** The ΔT [K] of each sample. */
  deltaT: number[];
  evaluations: number;
};

export type DeltaTOptions = {
  /**
   * ΔT samples from 0 to the end, both included.
   * @default 21
   */
  points?: number;
  /** A fixed current [A]; absent = each ΔT at its current of maximum Qc. */
  current?: number;
  currentLimit?: number;
};

export const DEFAULT_DELTA_T_POINTS = 21;

const fmt = (v: number) => Number(v.toPrecision(5)).toString();

export function deltaTCurveOf(solver: DeviceSolver, hotSide: number, options: DeltaTOptions, what: string): DeltaTCurve {
  const points = options.points ?? DEFAULT_DELTA_T_POINTS;
  if (!Number.isInteger(points) || points < 2 || points > 1000) throw new CaseError('deltaTPoints', 'must be a whole number from 2 to 1000');
  const limit = options.currentLimit ?? null;
  const fixed = options.current;
  let end: DevicePoint | undefined;
  if (fixed !== undefined) {
    if (!(Number.isFinite(fixed) && fixed > 0)) throw new CaseError('deltaTCurrent', 'must be a current in amperes, greater than 0');
    end = solver.at(fixed, hotSide, { heatLoad: 0 });
    if (!end) throw new CaseError('deltaTCurrent', `at ${fmt(fixed)} A ${what} has no steady state with Qc = 0 inside its materials' range`);
    if (!(end.coldSide < hotSide)) throw new CaseError('deltaTCurrent', `at ${fmt(fixed)} A ${what} does not cool at all (Joule heat outweighs Peltier cooling even at ΔT = 0): use a smaller current`);
  } else {
    end = maxDeltaTPoint(solver, hotSide);
    if (!end) throw new CaseError('hotSide', `${what} has no steady state with Qc = 0 at any current`);
  }
  const deltaTMax = hotSide - end.coldSide;
  const samples: DevicePoint[] = [];
  for (let k = 0; k < points; k++) {
    if (k === points - 1) {
      samples.push(end);
      continue;
    }
    const coldSide = hotSide - (deltaTMax * k) / (points - 1);
    // The optimum current moves smoothly with ΔT: extrapolate it from the last two points.
    const [last, before] = [samples[samples.length - 1], samples[samples.length - 2]];
    const hint = last && before ? 2 * last.current - before.current : last?.current;
    const p = fixed !== undefined ? solver.at(fixed, hotSide, { coldSide }) : maxHeatLoadPoint(solver, hotSide, coldSide, hint);
    if (!p) throw new CaseError(fixed !== undefined ? 'deltaTCurrent' : 'hotSide', `${what} has no steady state at ΔT = ${fmt(hotSide - coldSide)} K`);
    samples.push(p);
  }
  return {
    mode: fixed !== undefined ? 'fixedCurrent' : 'maxHeatLoadCurrent',
    hotSide,
    deltaTMax: flagged(end, limit),
    deltaT: samples.map((p) => p.hotSide - p.coldSide),
    currents: samples.map((p) => p.current),
    heatLoad: samples.map((p) => p.heatLoad),
    heatRejected: samples.map((p) => p.heatRejected),
    voltage: samples.map((p) => p.voltage),
    power: samples.map((p) => p.power),
    cop: samples.map((p) => p.cop),
    overLimit: samples.map((p) => limit !== null && p.current > limit),
    currentLimit: limit,
    evaluations: solver.evaluations(),
  };
}
