/**
 * Brent's root finder on a bracket (R. P. Brent, "Algorithms for Minimization
 * without Derivatives", Prentice-Hall 1973, ch. 4, procedure zero): inverse
 * quadratic interpolation and secant steps, safeguarded by bisection, so it
 * converges superlinearly on smooth functions and never leaves the bracket.
 * Written here because neither ml-matrix nor optimization-js has a scalar
 * root finder.
 */
export type RootResult = { root: number; value: number; evaluations: number };

/**
 * Root of f in [a, b] given f(a) = fa and f(b) = fb of opposite signs (or one
 * of them zero). Stops when the bracket is narrower than 2·(4ε|x| + tolerance/2).
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tolerance: number, maxEvaluations = 200): RootResult {
  if (fa === 0) return { root: a, value: 0, evaluations: 0 };
  if (fb === 0) return { root: b, value: 0, evaluations: 0 };
  if (Math.sign(fa) === Math.sign(fb)) throw new Error('brentRoot: the interval does not bracket a root');
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  let evaluations = 0;
  for (;;) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0 || evaluations >= maxEvaluations) return { root: b, value: fb, evaluations };
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m;
      e = m;
    } else {
      let s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      s = e;
      e = d;
      if (2 * p < 3 * m * q - Math.abs(tol * q) && p < Math.abs(0.5 * s * q)) {
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    evaluations++;
  }
}

/** A secant search's answer: the root, g there, and the local slope. */
export type SecantResult = RootResult & {
  slope: number;
  /** True when the root is the last trial plus a Newton correction smaller than the tolerance (not itself evaluated). */
  extrapolated: boolean;
  /** False when the search gave up: the root lies beyond [lower, upper] or the evaluation budget ran out. */
  converged: boolean;
};

/**
 * Root of a monotone function g from a guess and an estimate of its slope
 * (whose sign must be right): secant steps, kept inside the bracket once one
 * is known and replaced by bisection when they leave it or stall. It stops
 * as soon as the next correction is below the tolerance and applies that
 * correction without another evaluation — for the shooting solver that saves
 * one whole-leg integration per solve compared with Brent's bracket test.
 * Evaluations may return ±Infinity for "far too low/high" (a shot that left
 * the material's range); those only steer and bound, never interpolate.
 */
export function secantThenBrent(
  g: (x: number) => number,
  guess: number,
  slopeGuess: number,
  lower: number,
  upper: number,
  tolerance: number,
  maxEvaluations = 100,
): SecantResult {
  const increasing = slopeGuess > 0;
  // Bracket: below = largest x known to give g on the "too low" side, above = smallest on the other.
  let below = increasing ? lower : upper;
  let above = increasing ? upper : lower;
  let haveBelow = false;
  let haveAbove = false;
  let evaluations = 0;
  let slope = slopeGuess;
  let xPrev = NaN;
  let gPrev = NaN;
  let x = Math.min(upper, Math.max(lower, guess));
  let width = Math.abs(upper - lower);
  let stalls = 0;
  for (;;) {
    const gx = g(x);
    evaluations++;
    if (gx === 0) return { root: x, value: 0, evaluations, slope, extrapolated: false, converged: true };
    const low = gx < 0;
    if (low) {
      below = x;
      haveBelow = true;
    } else {
      above = x;
      haveAbove = true;
    }
    if (Number.isFinite(gx) && Number.isFinite(gPrev) && x !== xPrev) {
      const secant = (gx - gPrev) / (x - xPrev);
      if (Number.isFinite(secant) && secant !== 0 && secant > 0 === increasing) slope = secant;
    }
    if (Number.isFinite(gx) && Math.abs(gx / slope) <= tolerance) return { root: x - gx / slope, value: gx, evaluations, slope, extrapolated: true, converged: true };
    const bracketWidth = Math.abs(above - below);
    if (haveBelow && haveAbove && bracketWidth <= tolerance) return { root: 0.5 * (above + below), value: gx, evaluations, slope, extrapolated: false, converged: true };
    if (evaluations >= maxEvaluations) return { root: x, value: gx, evaluations, slope, extrapolated: false, converged: false };
    // Pinned at a bound with the root beyond it: no root inside [lower, upper].
    const wantsUp = low === increasing;
    if ((wantsUp && upper - x <= tolerance) || (!wantsUp && x - lower <= tolerance)) return { root: x, value: gx, evaluations, slope, extrapolated: false, converged: false };
    if (haveBelow && haveAbove) {
      if (bracketWidth > 0.5 * width) stalls++;
      else {
        stalls = 0;
        width = bracketWidth;
      }
    }
    let next: number;
    if (Number.isFinite(gx)) next = x - gx / slope;
    else next = low ? (increasing ? 0.5 * (x + upper) : 0.5 * (x + lower)) : increasing ? 0.5 * (x + lower) : 0.5 * (x + upper);
    const lo = Math.min(below, above);
    const hi = Math.max(below, above);
    if (!(next > lo && next < hi) || stalls >= 3) {
      // Outside what is known (or crawling): bisect the bracket, or halve the way to the bound.
      next = haveBelow && haveAbove ? 0.5 * (below + above) : 0.5 * (x + (low === increasing ? hi : lo));
      stalls = 0;
    }
    xPrev = x;
    gPrev = gx;
    x = next;
  }
}
