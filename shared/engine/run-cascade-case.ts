/**
 * What `leg cascade FILE` prints and a cascade run stores: the optimised (or,
 * with every current and count fixed, the evaluated) cascade, and its curves
 * of heat load against cold-side temperature with 0, 1 and 2 of its coldest
 * stages removed.
 */
import { cascadeSolver, type CascadePoint } from './cascade';
import type { CheckedCascadeCase } from './cascade-case';
import { CaseError } from './case-error';
import { cascadeCurve, upperStages, type CascadeCurve } from './cascade-curves';
import { optimizeCascade, type CascadeOptimizeOptions } from './optimize-cascade';

export type { CascadeCurve, CascadeCurvePoint } from './cascade-curves';

export type CascadeStageResult = { coldSide: number; hotSide: number; current: number; voltage: number; power: number; heatLoad: number; heatRejected: number; couples: number };

export type CascadeResult = {
  hotSide: number;
  coldSide: number;
  deltaT: number;
  /** W on the coldest stage. */
  heatLoad: number;
  objective: 'maxDeltaT' | 'minPower';
  wiring: 'series' | 'separate';
  /** Coldest first. */
  stages: CascadeStageResult[];
  power: number;
  cop: number | null;
  curves: CascadeCurve[];
  evaluations: number;
  seconds: number;
};

const clock = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

/** The cascade's result fields of one solved point. */
export function cascadeFields(c: CheckedCascadeCase, p: CascadePoint) {
  return {
    hotSide: c.hotSide,
    coldSide: p.coldSide,
    deltaT: c.hotSide - p.coldSide,
    heatLoad: p.heatLoad,
    objective: c.objective,
    wiring: c.wiring,
    stages: p.stages.map((s) => ({ ...s })),
    power: p.power,
    cop: p.cop,
  };
}

export function runCascade(c: CheckedCascadeCase, options: CascadeOptimizeOptions & { now?: () => number } = {}): CascadeResult {
  const now = options.now ?? clock;
  const t0 = now();
  let point: CascadePoint;
  let evaluations: number;
  let counts: number[];
  if (c.currents.every((v) => v !== null) && !c.optimizeCouples) {
    // Nothing to optimise: evaluate the cascade as given.
    const solver = cascadeSolver({ stages: c.stages }, options.tolerance ?? 1e-9);
    const currents = c.wiring === 'series' ? c.stages.map(() => c.currents[0] as number) : (c.currents as number[]);
    const p = solver.at(currents, c.hotSide, { heatLoad: c.heatLoad });
    if (!p) throw new CaseError(c.wiring === 'series' ? 'current' : 'currents', `the cascade has no steady state at these currents with ${c.heatLoad} W on its coldest stage`);
    point = p;
    evaluations = solver.evaluations();
    counts = c.stages.map((s) => s.couples);
  } else {
    const r = optimizeCascade(c, options);
    point = r.point;
    evaluations = r.evaluations;
    counts = r.counts;
  }
  const solved: CheckedCascadeCase = { ...c, stages: c.stages.map((s, k) => ({ ...s, couples: counts[k] })) };
  const curves: CascadeCurve[] = [];
  for (let drop = 0; drop <= 2 && drop < c.stages.length; drop++) {
    if (options.shouldStop?.() && drop > 0) break;
    const r = cascadeCurve(upperStages(solved, drop), c.curvePoints, options.tolerance ?? 1e-9);
    curves.push(r.curve);
    evaluations += r.evaluations;
  }
  return { ...cascadeFields(c, point), curves, evaluations, seconds: (now() - t0) / 1000 };
}
