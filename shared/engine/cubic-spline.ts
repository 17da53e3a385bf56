/**
 * Cubic interpolating splines with "not-a-knot" ends, on any strictly
 * increasing grid.
 *
 * Why not-a-knot rather than natural ends: a natural spline forces a zero
 * second derivative at the ends, which is an O(h²) error wherever the data
 * curve (a Seebeck coefficient against temperature, a Fermi integral) is
 * curved at the end of its table; not-a-knot reproduces any cubic exactly
 * and keeps the O(h⁴) accuracy up to the ends. ml-matrix could solve the
 * system, but it is tridiagonal: the Thomas algorithm below is O(n) and
 * allocation-free, which matters for the 4 000-point band tables.
 *
 * Coefficients are stored flat, four per interval: on [x[i], x[i+1]] the
 * spline is a + b·t + c·t² + d·t³ with t = x − x[i].
 */

/** Per-interval cubic coefficients, 4 per interval (length 4·(n − 1)). */
export type SplineCoefficients = Float64Array;

/** Second derivatives M at the knots (not-a-knot ends). */
function knotCurvatures(x: ArrayLike<number>, y: ArrayLike<number>): Float64Array {
  const n = x.length;
  const m = new Float64Array(n);
  if (n <= 2) return m; // a straight line
  const h = new Float64Array(n - 1);
  const slope = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    h[i] = x[i + 1] - x[i];
    slope[i] = (y[i + 1] - y[i]) / h[i];
  }
  if (n === 3) {
    // Three points: the not-a-knot spline is the interpolating parabola.
    const curvature = (2 * (slope[1] - slope[0])) / (x[2] - x[0]);
    m.fill(curvature);
    return m;
  }
  // Unknowns M[1..n-2]; M[0] and M[n-1] are eliminated with the
  // not-a-knot conditions (third derivative continuous at x[1], x[n-2]).
  const k = n - 2;
  const sub = new Float64Array(k);
  const diag = new Float64Array(k);
  const sup = new Float64Array(k);
  const rhs = new Float64Array(k);
  for (let r = 0; r < k; r++) {
    const i = r + 1;
    sub[r] = h[i - 1];
    diag[r] = 2 * (h[i - 1] + h[i]);
    sup[r] = h[i];
    rhs[r] = 6 * (slope[i] - slope[i - 1]);
  }
  // M0 = M1·(1 + h0/h1) − (h0/h1)·M2
  const h0 = h[0];
  const h1 = h[1];
  diag[0] += h0 * (1 + h0 / h1);
  sup[0] -= (h0 * h0) / h1;
  // M[n-1] = M[n-2]·(1 + hb/ha) − (hb/ha)·M[n-3], hb = h[n-2], ha = h[n-3]
  const hb = h[n - 2];
  const ha = h[n - 3];
  diag[k - 1] += hb * (1 + hb / ha);
  sub[k - 1] -= (hb * hb) / ha;
  // Thomas algorithm (the modified system stays diagonally dominant).
  for (let r = 1; r < k; r++) {
    const w = sub[r] / diag[r - 1];
    diag[r] -= w * sup[r - 1];
    rhs[r] -= w * rhs[r - 1];
  }
  m[k] = rhs[k - 1] / diag[k - 1];
  for (let r = k - 2; r >= 0; r--) m[r + 1] = (rhs[r] - sup[r] * m[r + 2]) / diag[r];
  m[0] = m[1] * (1 + h0 / h1) - (h0 / h1) * m[2];
  m[n - 1] = m[n - 2] * (1 + hb / ha) - (hb / ha) * m[n - 3];
  return m;
}

/**
 * Not-a-knot cubic spline through (x[i], y[i]); x strictly increasing,
 * at least two points (two points give the straight line).
 */
export function splineCoefficients(x: ArrayLike<number>, y: ArrayLike<number>): SplineCoefficients {
  const n = x.length;
  if (n < 2 || y.length !== n) throw new Error('spline needs at least two points and as many values as abscissae');
  for (let i = 0; i < n - 1; i++) {
    if (!(x[i + 1] > x[i])) throw new Error('spline abscissae must be strictly increasing');
  }
  const m = knotCurvatures(x, y);
  const c = new Float64Array(4 * (n - 1));
  for (let i = 0; i < n - 1; i++) {
    const h = x[i + 1] - x[i];
    c[4 * i] = y[i];
    c[4 * i + 1] = (y[i + 1] - y[i]) / h - (h * (2 * m[i] + m[i + 1])) / 6;
    c[4 * i + 2] = m[i] / 2;
    c[4 * i + 3] = (m[i + 1] - m[i]) / (6 * h);
  }
  return c;
}

/**
 * Index i of the interval [x[i], x[i+1]] holding v, clamped to the first and
 * last interval (so values just outside extrapolate with the end cubic).
 */
export function findInterval(x: ArrayLike<number>, v: number): number {
  let lo = 0;
  let hi = x.length - 1;
  if (v <= x[1]) return 0;
  if (v >= x[hi - 1]) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= v) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Value of a spline at v. */
export function splineValue(x: ArrayLike<number>, c: SplineCoefficients, v: number): number {
  const i = findInterval(x, v);
  const t = v - x[i];
  const o = 4 * i;
  return c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
}

/** First derivative of a spline at v. */
export function splineSlope(x: ArrayLike<number>, c: SplineCoefficients, v: number): number {
  const i = findInterval(x, v);
  const t = v - x[i];
  const o = 4 * i;
  return c[o + 1] + t * (2 * c[o + 2] + 3 * t * c[o + 3]);
}
