/**
 * Brent's scalar minimiser (golden section with parabolic steps; R. P. Brent,
 * "Algorithms for Minimization without Derivatives", 1973, ch. 5, procedure
 * localmin). Used for the current alone and for the zT-optimal doping.
 * optimization-js offers only multivariate unconstrained methods, which do
 * not respect an interval and spend far more evaluations on one variable.
 */
export type ScalarMinimum = { x: number; value: number; evaluations: number };

const GOLDEN = 0.5 * (3 - Math.sqrt(5));

/** Minimum of f on [a, b] to within tolerance in x (absolute). */
export function brentMinimize(f: (x: number) => number, a: number, b: number, tolerance: number, maxEvaluations = 200): ScalarMinimum {
  let x = a + GOLDEN * (b - a);
  let w = x;
  let v = x;
  let fx = f(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  let evaluations = 1;
  for (;;) {
    const m = 0.5 * (a + b);
    const tol = Math.sqrt(Number.EPSILON) * Math.abs(x) + tolerance / 3;
    const t2 = 2 * tol;
    if (Math.abs(x - m) <= t2 - 0.5 * (b - a) || evaluations >= maxEvaluations) return { x, value: fx, evaluations };
    let golden = true;
    if (Math.abs(e) > tol) {
      // Parabola through (v, fv), (w, fw), (x, fx).
      let r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        if (u - a < t2 || b - u < t2) d = x < m ? tol : -tol;
        golden = false;
      }
    }
    if (golden) {
      e = (x < m ? b : a) - x;
      d = GOLDEN * e;
    }
    const u = Math.abs(d) >= tol ? x + d : d > 0 ? x + tol : x - tol;
    const fu = f(u);
    evaluations++;
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
}
