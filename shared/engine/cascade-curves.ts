/**
 * Heat load against cold-side temperature for a cascade (sink at hotSide):
 * at each Tc the largest heat load the coldest stage draws over the free
 * currents (the case's fixed currents stay fixed), from the lowest Tc the
 * cascade reaches with no load up to hotSide. The same for the cascade with
 * its coldest stage(s) removed shows what each extra stage buys.
 */
import { cascadeSolver } from './cascade';
import type { CheckedCascadeCase } from './cascade-case';
import { minimizeBox } from './box-bfgs';
import { CURRENT_BOUNDS, layoutOf, STEP } from './optimize-cascade';

export type CascadeCurvePoint = { coldSide: number; heatLoad: number; current: number[]; power: number };
export type CascadeCurve = { stages: number; points: CascadeCurvePoint[] };

/** The case's cascade without its `drop` coldest stages (their currents dropped too). */
export function upperStages(c: CheckedCascadeCase, drop: number): CheckedCascadeCase {
  return { ...c, stages: c.stages.slice(drop), currents: c.wiring === 'series' ? c.currents : c.currents.slice(drop) };
}

export function cascadeCurve(c: CheckedCascadeCase, points: number, tolerance = 1e-9): { curve: CascadeCurve; evaluations: number } {
  const solver = cascadeSolver({ stages: c.stages }, tolerance);
  const layout = layoutOf(c, solver);
  const nc = layout.freeGroups.length;
  const currentsOf = (x: readonly number[]) => {
    const out = layout.fixed.map((v) => v ?? 0);
    layout.freeGroups.forEach((group, i) => group.forEach((k) => (out[k] = x[i] * layout.reference[i])));
    return out;
  };
  const box = { lower: new Array<number>(nc).fill(CURRENT_BOUNDS[0]), upper: new Array<number>(nc).fill(CURRENT_BOUNDS[1]), steps: new Array<number>(nc).fill(STEP), gradientTolerance: 1e-5, valueTolerance: 1e-10 };
  // The end: the lowest cold side with no load.
  const lowest = (x: readonly number[]) => solver.at(currentsOf(x), c.hotSide, { heatLoad: 0 })?.coldSide ?? Infinity;
  let x = nc > 0 ? minimizeBox(lowest, new Array<number>(nc).fill(0.7), box).x : [];
  const end = solver.at(currentsOf(x), c.hotSide, { heatLoad: 0 });
  const out: CascadeCurvePoint[] = [];
  if (!end) return { curve: { stages: c.stages.length, points: out }, evaluations: solver.evaluations() };
  out.push({ coldSide: end.coldSide, heatLoad: end.heatLoad, current: end.stages.map((s) => s.current), power: end.power });
  for (let k = 1; k < points; k++) {
    const tc = end.coldSide + ((c.hotSide - end.coldSide) * k) / (points - 1);
    const load = (v: readonly number[]) => {
      const p = solver.at(currentsOf(v), c.hotSide, { coldSide: tc });
      return p ? -p.heatLoad : Infinity;
    };
    // Warm start from the neighbouring point's currents.
    if (nc > 0) x = minimizeBox(load, x, { ...box, valueTolerance: 1e-12 * Math.max(1, Math.abs(out[out.length - 1].heatLoad)) }).x;
    const p = solver.at(currentsOf(x), c.hotSide, { coldSide: tc });
    if (!p) continue;
    out.push({ coldSide: tc, heatLoad: p.heatLoad, current: p.stages.map((s) => s.current), power: p.power });
  }
  return { curve: { stages: c.stages.length, points: out }, evaluations: solver.evaluations() };
}
