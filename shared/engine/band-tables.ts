/**
 * Tables of the single-parabolic-band, acoustic-phonon transport factors as
 * functions of u = ln(reduced concentration), built once, lazily.
 *
 * The carrier concentration fixes the reduced Fermi level η through
 *   n = N(T)·F½(η),   N(T) = 4π(2m*kT/h²)^{3/2},
 * so u = ln(n/N(T)) = ln F½(η). Everything the solver needs is a smooth
 * function of u alone:
 *   s(u) = 2F₁/F₀ − η                       (Seebeck in units of k/e),
 *   ℓ(u) = (3F₀F₂ − 4F₁²)/F₀²               (Lorenz number in units of (k/e)²),
 *   g(u) = (√π/2)·F₀/F½                     (mobility over its non-degenerate value).
 * Why tables: finding η from n needs a root search on a quadrature; doing
 * that inside the ODE right-hand side would cost ~50 µs per call. A cubic
 * spline on a uniform u grid costs one floor and a few multiply-adds, is C²
 * (so the adaptive integrator keeps its order), and is checked against
 * direct quadrature in band-tables.test.ts.
 * Outside the table the exact non-degenerate and Sommerfeld expansions take
 * over, both accurate to ~1e-12 at the joins.
 */
import { fermiIntegralsByQuadrature, fermiZero } from './fermi-integrals';
import { splineCoefficients } from './cubic-spline';

/** Lower end of the table: η ≈ −15, where the two-term non-degenerate series is exact to ~1e-13. */
export const U_LOW = -15;
/** Upper end: η ≈ 51, where the Sommerfeld series is exact to ~1e-13. */
export const U_HIGH = 5.5;
/** Grid step in u; spline error ≈ (5/384)·h⁴·|f⁗| ≈ 2e-9·|f⁗|. */
export const U_STEP = 0.02;

const SQRT_PI_2 = Math.sqrt(Math.PI) / 2;
const PI2 = Math.PI * Math.PI;

/** Transport factors at one reduced concentration. */
export type BandFactors = { eta: number; seebeck: number; lorenz: number; mobility: number };

/** Factors from the Fermi integrals at η (exact formulas, no table). */
export function factorsFromIntegrals(eta: number, f0: number, fHalf: number, f1: number, f2: number): BandFactors {
  return {
    eta,
    seebeck: (2 * f1) / f0 - eta,
    lorenz: (3 * f0 * f2 - 4 * f1 * f1) / (f0 * f0),
    mobility: (SQRT_PI_2 * f0) / fHalf,
  };
}

/**
 * Sommerfeld expansion of F½ and its derivative for large η:
 * F_j ≈ η^{j+1}/(j+1) + Σ_k 2(1 − 2^{1−2k})ζ(2k)·Γ(j+1)/Γ(j+2−2k)·η^{j+1−2k}.
 * For j = ½ the first three corrections are π²/12·η^{−½}, 7π⁴/960·η^{−5/2},
 * 31π⁶/4608·η^{−9/2}; the next is ~1e-13 relative at η = 50.
 */
export function sommerfeldHalf(eta: number): { value: number; slope: number } {
  const r = Math.sqrt(eta);
  const c1 = PI2 / 12;
  const c2 = (7 * PI2 * PI2) / 960;
  const c3 = (31 * PI2 * PI2 * PI2) / 4608;
  const e2 = eta * eta;
  const value = (2 / 3) * eta * r + c1 / r + c2 / (e2 * r) + c3 / (e2 * e2 * r);
  const slope = r - (0.5 * c1) / (eta * r) - (2.5 * c2) / (e2 * eta * r) - (4.5 * c3) / (e2 * e2 * eta * r);
  return { value, slope };
}

/** Exact degenerate-limit factors for u above the table (η > ~51). */
export function degenerateFactors(u: number): BandFactors {
  const target = Math.exp(u);
  let eta = Math.pow(1.5 * target, 2 / 3);
  for (let i = 0; i < 30; i++) {
    const { value, slope } = sommerfeldHalf(eta);
    const step = (value - target) / slope;
    eta -= step;
    if (Math.abs(step) < 1e-15 * eta) break;
  }
  // With F₀ = η, F₁ = η²/2 + π²/6, F₂ = η³/3 + π²η/3 (exact up to e^−η):
  return {
    eta,
    seebeck: PI2 / (3 * eta),
    lorenz: PI2 / 3 - (PI2 * PI2) / (9 * eta * eta),
    mobility: (SQRT_PI_2 * eta) / sommerfeldHalf(eta).value,
  };
}

/**
 * Exact non-degenerate factors for u below the table (η < ~−15), to first
 * order in z = e^η (the next order is below 1e-13 there):
 * F_j = Γ(j+1)(z − z²/2^{j+1} + …), so e^η = r' + r'²/2^{3/2} with r' = F½/Γ(3/2).
 */
export function nonDegenerateFactors(u: number): BandFactors {
  const r = Math.exp(u) / SQRT_PI_2;
  const z = r + (r * r) / (2 * Math.SQRT2);
  const eta = Math.log(z);
  return {
    eta,
    seebeck: 2 + z / 2 - eta,
    lorenz: 2 + z / 4,
    mobility: 1 - z * (0.5 - 1 / (2 * Math.SQRT2)),
  };
}

/** Reduced Fermi level and factors at u by Newton on F½ with quadrature (slow; builds and checks tables). */
export function factorsByQuadrature(u: number, etaGuess?: number): BandFactors {
  const target = Math.exp(u);
  let eta = etaGuess ?? (u < 0 ? u - Math.log(SQRT_PI_2) : Math.pow(1.5 * target + 1, 2 / 3) - 0.5);
  let f = fermiIntegralsByQuadrature(eta, [0.5, -0.5, 1, 2]);
  for (let i = 0; i < 60; i++) {
    // d F½/dη = ½·F₋½; Newton on ln F½ converges from far away too.
    const step = (Math.log(f[0]) - u) / ((0.5 * f[1]) / f[0]);
    // Converged: the integrals at the current η are then within ~1e-11 of
    // those at the root, not worth another quadrature.
    if (Math.abs(step) < 1e-11 * Math.max(1, Math.abs(eta))) break;
    eta -= step;
    f = fermiIntegralsByQuadrature(eta, [0.5, -0.5, 1, 2]);
  }
  return factorsFromIntegrals(eta, fermiZero(eta), f[0], f[2], f[3]);
}

type BandTable = {
  /** Interleaved spline coefficients per cell: s(4), ℓ(4), g(4), η(4). */
  coefficients: Float64Array;
  cells: number;
};

let table: BandTable | undefined;

function buildTable(): BandTable {
  const points = Math.round((U_HIGH - U_LOW) / U_STEP) + 1;
  const u = new Float64Array(points);
  const columns = [new Float64Array(points), new Float64Array(points), new Float64Array(points), new Float64Array(points)];
  let guess: number | undefined;
  for (let i = 0; i < points; i++) {
    u[i] = U_LOW + i * U_STEP;
    const f = factorsByQuadrature(u[i], guess);
    columns[0][i] = f.seebeck;
    columns[1][i] = f.lorenz;
    columns[2][i] = f.mobility;
    columns[3][i] = f.eta;
    // Continuation: quadratic extrapolation from the last three points, good
    // to O(h³) ≈ 1e-5, so Newton needs one or two steps.
    guess = i > 1 ? 3 * f.eta - 3 * columns[3][i - 1] + columns[3][i - 2] : i > 0 ? 2 * f.eta - columns[3][i - 1] : f.eta + U_STEP;
  }
  const cells = points - 1;
  const coefficients = new Float64Array(cells * 16);
  columns.forEach((column, k) => {
    const c = splineCoefficients(u, column);
    for (let i = 0; i < cells; i++) {
      for (let p = 0; p < 4; p++) coefficients[16 * i + 4 * k + p] = c[4 * i + p];
    }
  });
  return { coefficients, cells };
}

/** The table, built on first use (~30 ms). */
function bandTable(): BandTable {
  if (!table) table = buildTable();
  return table;
}

/** Scratch for the hot path: Seebeck, Lorenz and mobility factors. */
export type FactorOut = { seebeck: number; lorenz: number; mobility: number };

/**
 * s, ℓ, g at u into out — the solver's inner-loop call: no allocation, one
 * table cell lookup.
 */
export function bandFactorsInto(u: number, out: FactorOut): void {
  if (u < U_LOW || u > U_HIGH) {
    const f = u < U_LOW ? nonDegenerateFactors(u) : degenerateFactors(u);
    out.seebeck = f.seebeck;
    out.lorenz = f.lorenz;
    out.mobility = f.mobility;
    return;
  }
  const { coefficients: c, cells } = bandTable();
  let i = Math.floor((u - U_LOW) / U_STEP);
  if (i >= cells) i = cells - 1;
  const t = u - (U_LOW + i * U_STEP);
  const o = 16 * i;
  out.seebeck = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
  out.lorenz = c[o + 4] + t * (c[o + 5] + t * (c[o + 6] + t * c[o + 7]));
  out.mobility = c[o + 8] + t * (c[o + 9] + t * (c[o + 10] + t * c[o + 11]));
}

/** Scratch for the two-band solve: η(u) and its slope dη/du, with the transport factors. */
export type FactorEtaOut = FactorOut & { eta: number; etaSlope: number };

/**
 * s, ℓ, g, η and dη/du at u into out (no allocation). The two-band model's
 * charge-neutrality Newton needs η and its slope; outside the table the
 * closed forms give them exactly.
 */
export function bandFactorsEtaInto(u: number, out: FactorEtaOut): void {
  if (u < U_LOW) {
    const f = nonDegenerateFactors(u);
    const r = Math.exp(u) / SQRT_PI_2;
    const z = r + (r * r) / (2 * Math.SQRT2);
    out.seebeck = f.seebeck;
    out.lorenz = f.lorenz;
    out.mobility = f.mobility;
    out.eta = f.eta;
    // η = ln z, z = r + r²/2^{3/2}, dr/du = r.
    out.etaSlope = (r + (r * r) / Math.SQRT2) / z;
    return;
  }
  if (u > U_HIGH) {
    const f = degenerateFactors(u);
    const { value, slope } = sommerfeldHalf(f.eta);
    out.seebeck = f.seebeck;
    out.lorenz = f.lorenz;
    out.mobility = f.mobility;
    out.eta = f.eta;
    // u = ln F½(η): dη/du = F½/F½′.
    out.etaSlope = value / slope;
    return;
  }
  const { coefficients: c, cells } = bandTable();
  let i = Math.floor((u - U_LOW) / U_STEP);
  if (i >= cells) i = cells - 1;
  const t = u - (U_LOW + i * U_STEP);
  const o = 16 * i;
  out.seebeck = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
  out.lorenz = c[o + 4] + t * (c[o + 5] + t * (c[o + 6] + t * c[o + 7]));
  out.mobility = c[o + 8] + t * (c[o + 9] + t * (c[o + 10] + t * c[o + 11]));
  out.eta = c[o + 12] + t * (c[o + 13] + t * (c[o + 14] + t * c[o + 15]));
  out.etaSlope = c[o + 13] + t * (2 * c[o + 14] + 3 * t * c[o + 15]);
}

/** Only η(u) and dη/du into out: the two-band neutrality iteration's call. */
export function bandEtaInto(u: number, out: FactorEtaOut): void {
  if (u < U_LOW || u > U_HIGH) {
    bandFactorsEtaInto(u, out);
    return;
  }
  const { coefficients: c, cells } = bandTable();
  let i = Math.floor((u - U_LOW) / U_STEP);
  if (i >= cells) i = cells - 1;
  const t = u - (U_LOW + i * U_STEP);
  const o = 16 * i + 12;
  out.eta = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
  out.etaSlope = c[o + 1] + t * (2 * c[o + 2] + 3 * t * c[o + 3]);
}

/** All factors including η at u (for plots and reports; not the hot path). */
export function bandFactors(u: number): BandFactors {
  if (u < U_LOW) return nonDegenerateFactors(u);
  if (u > U_HIGH) return degenerateFactors(u);
  const out: FactorOut = { seebeck: 0, lorenz: 0, mobility: 0 };
  bandFactorsInto(u, out);
  const { coefficients: c, cells } = bandTable();
  let i = Math.floor((u - U_LOW) / U_STEP);
  if (i >= cells) i = cells - 1;
  const t = u - (U_LOW + i * U_STEP);
  const o = 16 * i + 12;
  const eta = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
  return { eta, ...out };
}
