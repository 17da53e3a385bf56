/**
 * How much each doping node may be off before the leg loses 1 K of ΔT —
 * what the crystal grower's tolerances are derived from.
 *
 * For node k, ΔT is evaluated with that node moved by ±h decades, the
 * current and heat load held at the design's values (the leg as built and
 * driven). Central differences give dΔT/dlog10 n and d²ΔT/dlog10 n². At an
 * interior optimum the first derivative is ~0, so the tolerance comes from
 * the curvature: the quadratic model ΔT(δ) ≈ ΔT + f'δ + ½f''δ² loses 1 K at
 * the roots of ½f''δ² + f'δ + 1 = 0, one on each side (none on a side
 * where the model never loses 1 K).
 */
import { CaseError } from './case-error';
import type { Leg } from './leg-profile';
import { solveLegProblem } from './solve-leg';

export type NodeSensitivity = {
  /** Node index and position (fraction of the length from the cold end). */
  node: number;
  x: number;
  perCm3: number;
  /** dΔT/dlog10(n) [K per decade]. */
  firstDerivative: number;
  /** d²ΔT/dlog10(n)² [K per decade²]. */
  secondDerivative: number;
  /** Largest decrease and increase of log10 n [decades] costing 1 K by the quadratic model; null if none. */
  minusDecades: number | null;
  plusDecades: number | null;
};

/** Step of the central differences [decades]: truncation error ~h²·f⁗/12, far above the solver's noise. */
export const SENSITIVITY_STEP = 0.02;
/** The ΔT loss the tolerances are quoted for [K]. */
export const TOLERATED_LOSS = 1;

type Design = {
  x: readonly number[];
  log10: readonly number[];
  current: number;
  heatLoad: number;
  hotSide: number;
  build: (log10: readonly number[]) => Leg;
  minLog10: number;
  maxLog10: number;
  tolerance: number;
};

/** Roots of ½f''δ² + f'δ + loss = 0: the nearest on each side of 0. */
export function toleranceBand(first: number, second: number, loss = TOLERATED_LOSS): { minus: number | null; plus: number | null } {
  const a = 0.5 * second;
  const b = first;
  const c = loss;
  const roots: number[] = [];
  if (Math.abs(a) < 1e-300) {
    if (b !== 0) roots.push(-c / b);
  } else {
    const disc = b * b - 4 * a * c;
    if (disc >= 0) {
      // Numerically stable pair.
      const q = -0.5 * (b + Math.sign(b || 1) * Math.sqrt(disc));
      roots.push(q / a);
      if (q !== 0) roots.push(c / q);
    }
  }
  const plus = roots.filter((r) => r > 0).sort((u, v) => u - v)[0];
  const minus = roots.filter((r) => r < 0).sort((u, v) => v - u)[0];
  return { minus: minus ?? null, plus: plus ?? null };
}

export function nodeSensitivities(design: Design): { nodes: NodeSensitivity[]; evaluations: number } {
  let evaluations = 0;
  const deltaT = (log10: readonly number[]) => {
    evaluations++;
    try {
      return solveLegProblem({ leg: design.build(log10), hotSide: design.hotSide, current: design.current, heatLoad: design.heatLoad }, { tolerance: design.tolerance, estimateError: false, profilePoints: 2 })
        .deltaT;
    } catch (e) {
      if (e instanceof CaseError) return NaN; // no steady state with this node moved
      throw e;
    }
  };
  const f0 = deltaT(design.log10);
  const h = SENSITIVITY_STEP;
  const nodes = design.log10.map((y, k): NodeSensitivity => {
    const at = (d: number) => deltaT(design.log10.map((v, i) => (i === k ? v + d : v)));
    let first: number;
    let second: number;
    if (y - h < design.minLog10) {
      // One-sided at the family's lower edge: f0, f(+h), f(+2h).
      const f1 = at(h);
      const f2 = at(2 * h);
      first = (-3 * f0 + 4 * f1 - f2) / (2 * h);
      second = (f0 - 2 * f1 + f2) / (h * h);
    } else if (y + h > design.maxLog10) {
      const f1 = at(-h);
      const f2 = at(-2 * h);
      first = (3 * f0 - 4 * f1 + f2) / (2 * h);
      second = (f0 - 2 * f1 + f2) / (h * h);
    } else {
      const fp = at(h);
      const fm = at(-h);
      first = (fp - fm) / (2 * h);
      second = (fp - 2 * f0 + fm) / (h * h);
    }
    const band = toleranceBand(first, second);
    return { node: k, x: design.x[k], perCm3: Math.pow(10, y), firstDerivative: first, secondDerivative: second, minusDecades: band.minus, plusDecades: band.plus };
  });
  return { nodes, evaluations };
}
