/**
 * Complete Fermi–Dirac integrals, unnormalised:
 *
 *   F_j(η) = ∫₀^∞ x^j / (1 + e^(x − η)) dx,   j > −1.
 *
 * Direct quadrature here is accurate to ~1e-15 relative but costs hundreds of
 * exponentials; it builds the band-model tables once (band-tables.ts) and
 * checks them in the tests. The solver never calls it.
 */
import { gaussLegendre } from './gauss-legendre';

/** F₀(η) = ln(1 + e^η), exactly (softplus, written to avoid overflow). */
export function fermiZero(eta: number): number {
  return eta > 0 ? eta + Math.log1p(Math.exp(-eta)) : Math.log1p(Math.exp(eta));
}

const HEAD_RULE = gaussLegendre(24);
const PANEL_RULE = gaussLegendre(12);
/** Fermi factor below e^-46 ≈ 1e-20 relative: the tail is negligible. */
const TAIL = 46;
/** Panel widths grow by this factor away from the Fermi edge. */
const GROWTH = 1.6;

/** x^j for the orders the band model needs, without Math.pow where avoidable. */
function power(x: number, root: number, j: number): number {
  switch (j) {
    case 0:
      return 1;
    case 0.5:
      return root;
    case -0.5:
      return 1 / root;
    case 1:
      return x;
    case 2:
      return x * x;
    default:
      return Math.pow(x, j);
  }
}

/**
 * Panel break points on [2, η⁺ + TAIL], graded geometrically away from the
 * Fermi edge at max(η, 2). The integrand's nearest singularities are the
 * poles at x = η ± iπ and (for non-integer j) the branch point at x = 0;
 * keeping each panel's width below its distance from both keeps 12-point
 * Gauss–Legendre at ~1e-16 with far fewer panels than a uniform split.
 */
function panelBreaks(eta: number): number[] {
  const edge = Math.max(eta, 2);
  const left: number[] = [];
  let b = edge;
  let w = 2;
  while (b > 2) {
    const width = Math.min(w, b - 2, b / 2);
    const a = b - width < 2 + 1e-9 ? 2 : b - width;
    left.push(a);
    b = a;
    w *= GROWTH;
  }
  const breaks = left.reverse();
  breaks.push(edge);
  const upper = Math.max(eta, 0) + TAIL;
  let a = edge;
  w = 2;
  while (a < upper) {
    a = Math.min(a + w, upper);
    breaks.push(a);
    w *= GROWTH;
  }
  return breaks;
}

/**
 * Several F_j(η) at once by quadrature, sharing the Fermi factor.
 *
 * Why this split: on [0, 2] the substitution x = t² removes the √x branch
 * point at 0 (for half-integer j) so Gauss–Legendre converges geometrically;
 * beyond x = 2 the integrand is analytic within a distance π of the real axis
 * (poles of the Fermi factor at x = η ± iπ), so graded 12-point panels
 * converge to ~1e-16.
 */
export function fermiIntegralsByQuadrature(eta: number, orders: readonly number[]): number[] {
  for (const j of orders) if (!(j > -1)) throw new Error(`Fermi integral order must exceed −1, got ${j}`);
  const sums = orders.map(() => 0);
  const fermi = (x: number): number => {
    const a = x - eta;
    // 1/(1+e^a) written stably for large |a|.
    return a > 0 ? Math.exp(-a) / (1 + Math.exp(-a)) : 1 / (1 + Math.exp(a));
  };
  // Head: x = t², t ∈ [0, √2], dx = 2t dt, so x^j dx = 2·t^(2j+1) dt.
  const tMax = Math.SQRT2;
  for (let i = 0; i < HEAD_RULE.nodes.length; i++) {
    const t = 0.5 * tMax * (HEAD_RULE.nodes[i] + 1);
    const f = 2 * t * fermi(t * t) * 0.5 * tMax * HEAD_RULE.weights[i];
    for (let k = 0; k < orders.length; k++) sums[k] += f * power(t * t, t, orders[k]);
  }
  const breaks = panelBreaks(eta);
  for (let p = 0; p + 1 < breaks.length; p++) {
    const half = 0.5 * (breaks[p + 1] - breaks[p]);
    const mid = 0.5 * (breaks[p + 1] + breaks[p]);
    for (let i = 0; i < PANEL_RULE.nodes.length; i++) {
      const x = mid + half * PANEL_RULE.nodes[i];
      const f = fermi(x) * half * PANEL_RULE.weights[i];
      const root = Math.sqrt(x);
      for (let k = 0; k < orders.length; k++) sums[k] += f * power(x, root, orders[k]);
    }
  }
  return sums;
}

/** One F_j(η) by quadrature. */
export function fermiIntegral(j: number, eta: number): number {
  return fermiIntegralsByQuadrature(eta, [j])[0];
}
