/**
 * Minimise a smooth function on a box (lower ≤ x ≤ upper): quasi-Newton with
 * a dense BFGS inverse Hessian (ml-matrix), variables at a bound with the
 * gradient pushing outwards held fixed for the step (an active set), and a
 * projected backtracking line search with the Armijo condition. Gradients
 * are forward differences, one evaluation per free variable.
 *
 * Why not optimization-js's L-BFGS: it has no bounds, a fixed-size step
 * heuristic in place of a line search, no iteration limit and no way to
 * report progress or stop — all four are needed here (doping bounds, a
 * noisy-at-1e-9 objective, a worker that streams and cancels).
 * Problems here have ≤ ~40 variables, so a dense n×n matrix is cheap next to
 * one objective evaluation (a whole-leg solve).
 */
import { Matrix } from 'ml-matrix';

export type BoxOptions = {
  lower: readonly number[];
  upper: readonly number[];
  /** Finite-difference step per variable. */
  steps: readonly number[];
  /** @default 200 */
  maxIterations?: number;
  /** Stop when every projected gradient component is at most this. @default 1e-6 */
  gradientTolerance?: number;
  /** Stop after two iterations in a row improving f by less than this. @default 1e-9 */
  valueTolerance?: number;
  /** Largest change of any variable in the first step. @default 0.25 */
  initialStep?: number;
  /**
   * Gradient at a point just evaluated (f(x) = fx), when the caller has a
   * better one than forward differences; return undefined to fall back.
   */
  gradient?: (x: readonly number[], fx: number) => number[] | undefined;
  /** Called after every iteration with the new point and value. */
  onIteration?: (iteration: number, x: readonly number[], value: number) => void;
  /** Checked before every iteration; true ends the run, keeping the best point. */
  shouldStop?: () => boolean;
};

export type BoxResult = {
  x: number[];
  value: number;
  iterations: number;
  evaluations: number;
  reason: 'converged' | 'stalled' | 'maxIterations' | 'stopped';
};

const ARMIJO = 1e-4;

export function minimizeBox(f: (x: readonly number[]) => number, start: readonly number[], options: BoxOptions): BoxResult {
  const n = start.length;
  const { lower, upper, steps } = options;
  const maxIterations = options.maxIterations ?? 200;
  const gradientTolerance = options.gradientTolerance ?? 1e-6;
  const valueTolerance = options.valueTolerance ?? 1e-9;
  const initialStep = options.initialStep ?? 0.25;
  const clamp = (v: number, i: number) => Math.min(upper[i], Math.max(lower[i], v));
  let evaluations = 0;
  const value = (x: readonly number[]) => {
    evaluations++;
    const v = f(x);
    return Number.isNaN(v) ? Infinity : v;
  };
  const gradient = (x: readonly number[], fx: number): number[] => {
    const supplied = options.gradient?.(x, fx);
    if (supplied) return supplied;
    const g = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      const h = steps[i];
      const forward = x[i] + h <= upper[i];
      const probe = [...x];
      probe[i] = forward ? x[i] + h : x[i] - h;
      let fp = value(probe);
      let d = forward ? (fp - fx) / h : (fx - fp) / h;
      if (!Number.isFinite(fp) && forward && x[i] - h >= lower[i]) {
        // Infeasible one way: difference the other way.
        probe[i] = x[i] - h;
        fp = value(probe);
        d = (fx - fp) / h;
      }
      g[i] = Number.isFinite(d) ? d : 0;
    }
    return g;
  };

  let x = start.map(clamp);
  let fx = value(x);
  if (!Number.isFinite(fx)) return { x, value: fx, iterations: 0, evaluations, reason: 'stalled' };
  let g = gradient(x, fx);
  const scaledIdentity = (grad: number[]) => Matrix.eye(n, n, initialStep / Math.max(1e-300, ...grad.map(Math.abs)));
  let H = scaledIdentity(g);
  let fresh = true; // H is still the scaled identity
  let smallSteps = 0;

  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    if (options.shouldStop?.()) return { x, value: fx, iterations: iteration - 1, evaluations, reason: 'stopped' };
    const free: number[] = [];
    for (let i = 0; i < n; i++) {
      const atLower = x[i] <= lower[i] + 1e-12 && g[i] > 0;
      const atUpper = x[i] >= upper[i] - 1e-12 && g[i] < 0;
      if (!atLower && !atUpper) free.push(i);
    }
    const projected = free.reduce((m, i) => Math.max(m, Math.abs(g[i])), 0);
    if (free.length === 0 || projected <= gradientTolerance) return { x, value: fx, iterations: iteration - 1, evaluations, reason: 'converged' };

    let accepted: { x: number[]; f: number } | undefined;
    for (let attempt = 0; attempt < 2 && !accepted; attempt++) {
      if (attempt === 1) {
        if (fresh) break;
        H = scaledIdentity(g);
        fresh = true;
      }
      const gFree = Matrix.columnVector(free.map((i) => g[i]));
      const dFree = H.selection(free, free).mmul(gFree).mul(-1).to1DArray();
      const d = new Array<number>(n).fill(0);
      free.forEach((i, k) => (d[i] = dFree[k]));
      let slope = 0;
      for (let i = 0; i < n; i++) slope += g[i] * d[i];
      if (!(slope < 0)) {
        if (fresh) break;
        continue; // not a descent direction: retry from the identity
      }
      let alpha = 1;
      for (let tries = 0; tries < 40; tries++) {
        const xt = x.map((xi, i) => clamp(xi + alpha * d[i], i));
        let decrease = 0;
        for (let i = 0; i < n; i++) decrease += g[i] * (xt[i] - x[i]);
        const ft = value(xt);
        if (Number.isFinite(ft) && ft <= fx + ARMIJO * decrease) {
          accepted = { x: xt, f: ft };
          break;
        }
        // Quadratic model along the path when usable, else halve.
        const predicted = Number.isFinite(ft) && decrease < 0 ? (-decrease * alpha) / (2 * (ft - fx - decrease)) : 0.5 * alpha;
        alpha = Math.min(0.5 * alpha, Math.max(0.1 * alpha, predicted));
        if (alpha * Math.max(...d.map(Math.abs)) < 1e-14) break;
      }
    }
    if (!accepted) return { x, value: fx, iterations: iteration, evaluations, reason: 'stalled' };

    const gt = gradient(accepted.x, accepted.f);
    const s = accepted.x.map((v, i) => v - x[i]);
    const y = gt.map((v, i) => v - g[i]);
    let sy = 0;
    let yy = 0;
    let ss = 0;
    for (let i = 0; i < n; i++) {
      sy += s[i] * y[i];
      yy += y[i] * y[i];
      ss += s[i] * s[i];
    }
    if (sy > 1e-12 * Math.sqrt(ss * yy)) {
      if (fresh) H = Matrix.eye(n, n, sy / yy); // Shanno–Phua scaling of the first update
      const rho = 1 / sy;
      const sCol = Matrix.columnVector(s);
      const Hy = H.mmul(Matrix.columnVector(y));
      const yHy = Matrix.columnVector(y).transpose().mmul(Hy).get(0, 0);
      H = H.sub(Hy.mmul(sCol.transpose()).add(sCol.mmul(Hy.transpose())).mul(rho)).add(sCol.mmul(sCol.transpose()).mul(rho * rho * yHy + rho));
      fresh = false;
    }
    const improvement = fx - accepted.f;
    x = accepted.x;
    fx = accepted.f;
    g = gt;
    options.onIteration?.(iteration, x, fx);
    smallSteps = improvement < valueTolerance ? smallSteps + 1 : 0;
    if (smallSteps >= 2) return { x, value: fx, iterations: iteration, evaluations, reason: 'converged' };
  }
  return { x, value: fx, iterations: maxIterations, evaluations, reason: 'maxIterations' };
}
