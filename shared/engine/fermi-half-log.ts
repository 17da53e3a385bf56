/**
 * G(η) = ln F½(η) and its slope, as a cubic spline on a uniform η grid —
 * the inverse of the band table's η(u) (u = ln F½(η), band-tables.ts).
 *
 * Why: in the two-band model the minority band's reduced Fermi level is
 * fixed by the majority's, ηₙ = −η − Eg/kT, so its carrier density needs
 * F½ at a given η, inside the integrator's inner loop. The table is built
 * by inverting the band table's own η(u) spline with Newton's method (no
 * quadrature, ~1 ms), so a band treated as minority gets exactly the
 * numbers it would get as a majority band at the same η. Spline error on
 * this grid: (5/384)·h⁴·|G⁗| < 1e-10; inversion to 1e-14.
 * Outside the grid the closed forms that band-tables.ts uses take over
 * (first-order non-degenerate series below, Sommerfeld above), inverted
 * exactly.
 */
import { bandFactorsEtaInto, sommerfeldHalf, type FactorEtaOut } from './band-tables';
import { splineCoefficients } from './cubic-spline';

/** Grid ends, inside the band table's η range (≈ −14.9 … 51.3). */
export const ETA_LOW = -14.5;
export const ETA_HIGH = 50;
export const ETA_STEP = 0.02;

const LN_SQRT_PI_2 = Math.log(Math.sqrt(Math.PI) / 2);

/** G and dG/dη. */
export type LogFermiOut = { value: number; slope: number };

let coefficients: Float64Array | undefined;
let cells = 0;

function build(): Float64Array {
  const points = Math.round((ETA_HIGH - ETA_LOW) / ETA_STEP) + 1;
  const eta = new Float64Array(points);
  const g = new Float64Array(points);
  const f: FactorEtaOut = { seebeck: 0, lorenz: 0, mobility: 0, eta: 0, etaSlope: 1 };
  let u = ETA_LOW + LN_SQRT_PI_2;
  for (let i = 0; i < points; i++) {
    eta[i] = ETA_LOW + i * ETA_STEP;
    for (let k = 0; k < 50; k++) {
      bandFactorsEtaInto(u, f);
      const step = (f.eta - eta[i]) / f.etaSlope;
      u -= step;
      if (Math.abs(step) < 1e-14 * Math.max(1, Math.abs(u))) break;
    }
    g[i] = u;
  }
  cells = points - 1;
  return splineCoefficients(eta, g);
}

/** ln F½(η) and its slope into out; no allocation after the first call. */
export function logFermiHalfInto(eta: number, out: LogFermiOut): void {
  if (eta < ETA_LOW) {
    // Invert z = r + r²/2^{3/2} (z = e^η, r = F½/Γ(3/2)), the form nonDegenerateFactors uses:
    // r = 2z/(1 + √(1 + √2·z)), written to stay finite for any η.
    const z = Math.exp(eta);
    const root = Math.sqrt(1 + Math.SQRT2 * z);
    const r = (2 * z) / (1 + root);
    out.value = LN_SQRT_PI_2 + eta + Math.log(2 / (1 + root));
    out.slope = z === 0 ? 1 : z / (r * (1 + r / Math.SQRT2));
    return;
  }
  if (eta > ETA_HIGH) {
    const s = sommerfeldHalf(eta);
    out.value = Math.log(s.value);
    out.slope = s.slope / s.value;
    return;
  }
  if (!coefficients) coefficients = build();
  const c = coefficients;
  let i = Math.floor((eta - ETA_LOW) / ETA_STEP);
  if (i >= cells) i = cells - 1;
  const t = eta - (ETA_LOW + i * ETA_STEP);
  const o = 4 * i;
  out.value = c[o] + t * (c[o + 1] + t * (c[o + 2] + t * c[o + 3]));
  out.slope = c[o + 1] + t * (2 * c[o + 2] + 3 * t * c[o + 3]);
}
