/**
 * An independent reference for the band model (band-model.ts and its tables
 * in band-tables.ts): the transport integrals by adaptive Gauss–Kronrod
 * quadrature and the reduced Fermi level by bisection. It shares no code with
 * the engine (not fermi-integrals.ts, not gauss-legendre.ts, not its root
 * finders) and uses another form of the integrals: the engine integrates
 * the Fermi function f(x) = 1/(1 + e^(x−η)) against powers of x, this file
 * integrates the "window" −∂f/∂x = 1/(4·cosh²((x − η)/2)) — the form in which
 * transport coefficients are usually written (e.g. G. S. Nolas, J. Sharp,
 * H. J. Goldsmid, Thermoelectrics (Springer 2001), ch. 2, from memory) —
 * and takes S and L as the window's first moment and variance, so that
 * neither cancels digits when degenerate. Integrating by parts,
 *   F_j(η) = ∫₀^∞ x^j f dx = (1/(j+1))·∫₀^∞ x^{j+1}·(−∂f/∂x) dx,
 * so with the acoustic-phonon weight W(x) = x·(−∂f/∂x) (energy-independent
 * mean free path):
 *   ∫W = F₀,  ∫x·W = 2F₁,  ∫x²·W = 3F₂,
 *   S/(k/e) = ∫(x − η)·W / ∫W = 2F₁/F₀ − η,
 *   L/(k/e)² = ∫(x − ⟨x⟩)²·W / ∫W = 3F₂/F₀ − (2F₁/F₀)²,  ⟨x⟩ = ∫x·W / ∫W,
 *   F½ = (2/3)·∫x^{3/2}·(−∂f/∂x) dx = (4/3)·∫t⁴·(−∂f/∂x)(t²) dt   (x = t², smooth at 0).
 */

// Gauss–Kronrod 7–15 nodes and weights on [−1, 1] (R. Piessens et al.,
// QUADPACK (Springer 1983), routine QK15; from memory, rounded to double
// precision). The test that uses them checks that they integrate
// polynomials up to degree 22 (Kronrod) and 13 (Gauss) exactly.
const XGK = [
  0.9914553711208126, 0.9491079123427585, 0.8648644233597691, 0.7415311855993945, 0.5860872354676911, 0.4058451513773972, 0.20778495500789848, 0,
];
const WGK = [
  0.022935322010529224, 0.06309209262997856, 0.10479001032225019, 0.14065325971552592, 0.1690047266392679, 0.19035057806478542, 0.20443294007529889,
  0.20948214108472782,
];
/** 7-point Gauss weights, for the Kronrod nodes 1, 3, 5 (and the centre). */
const WG = [0.1294849661688697, 0.27970539148927664, 0.3818300505051189, 0.4179591836734694];

export type Rule = { kronrod: number; gauss: number; absolute: number };

/** The 15-point Kronrod and embedded 7-point Gauss values of ∫f over [a, b], and ∫|f| by the Kronrod rule. */
export function gaussKronrod(f: (x: number) => number, a: number, b: number): Rule {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  let kronrod = WGK[7] * fc;
  let gauss = WG[3] * fc;
  let absolute = WGK[7] * Math.abs(fc);
  for (let j = 0; j < 7; j++) {
    const f1 = f(c - h * XGK[j]);
    const f2 = f(c + h * XGK[j]);
    kronrod += WGK[j] * (f1 + f2);
    absolute += WGK[j] * (Math.abs(f1) + Math.abs(f2));
    if (j % 2 === 1) gauss += WG[(j - 1) / 2] * (f1 + f2);
  }
  return { kronrod: kronrod * h, gauss: gauss * h, absolute: absolute * Math.abs(h) };
}

/**
 * ∫f over consecutive pieces [p₀, p₁], [p₁, p₂], … by adaptive bisection:
 * an interval is accepted when its Kronrod and Gauss values differ by at most
 * `tolerance` × the larger of its own ∫|f| and its share (by width) of the
 * whole ∫|f| — so the total error stays below ~2·tolerance·∫|f|, and a sharp
 * peak (the window is ~1/√η wide in t = √x) is not asked for more digits
 * than rounding leaves. That difference is the 7-point rule's error; the
 * 15-point value kept is far more accurate still.
 */
export function adaptiveIntegral(f: (x: number) => number, points: readonly number[], tolerance = 1e-14): number {
  const first = points[0];
  const span = points[points.length - 1] - first;
  let scale = 0;
  for (let i = 0; i + 1 < points.length; i++) scale += gaussKronrod(f, points[i], points[i + 1]).absolute;
  let total = 0;
  const stack: [number, number][] = [];
  for (let i = points.length - 2; i >= 0; i--) if (points[i + 1] > points[i]) stack.push([points[i], points[i + 1]]);
  let intervals = 0;
  while (stack.length > 0) {
    const [a, b] = stack.pop() as [number, number];
    const r = gaussKronrod(f, a, b);
    const allowed = tolerance * Math.max(r.absolute, (scale * (b - a)) / span);
    if (Math.abs(r.kronrod - r.gauss) <= allowed || b - a < 1e-12 * span) {
      total += r.kronrod;
    } else {
      const m = 0.5 * (a + b);
      stack.push([m, b], [a, m]);
    }
    if (++intervals > 100000) throw new Error('adaptiveIntegral: no convergence');
  }
  return total;
}

/** −∂f/∂x at x for reduced Fermi level η: 1/(4·cosh²((x − η)/2)), symmetric about η, never overflowing to NaN. */
const window = (x: number, eta: number) => {
  const c = Math.cosh(0.5 * (x - eta));
  return 1 / (4 * c * c);
};

/** Where the window is negligible: e^(−70) ≈ 4e-31 of its peak. */
const reach = (eta: number) => Math.max(eta, 0) + 70;

/** F½(η) = (4/3)∫t⁴·(−∂f/∂x)(t²) dt over t ≥ 0. */
export function fermiHalfByWindow(eta: number): number {
  const top = Math.sqrt(reach(eta));
  const points = eta > 0 ? [0, Math.sqrt(eta), top] : [0, top];
  return (4 / 3) * adaptiveIntegral((t) => t * t * t * t * window(t * t, eta), points);
}

export type WindowTransport = {
  /** F₀ = ∫W, F½ by its own quadrature. */
  f0: number;
  fHalf: number;
  /** S/(k/e), L/(k/e)² and μ/μ₀ = (√π/2)F₀/F½. */
  seebeck: number;
  lorenz: number;
  mobility: number;
};

/** The acoustic-phonon transport factors at reduced Fermi level η from the window moments. */
export function transportByWindow(eta: number): WindowTransport {
  const top = reach(eta);
  const points = eta > 0 ? [0, eta, top] : [0, top];
  const weight = (x: number) => x * window(x, eta);
  const f0 = adaptiveIntegral(weight, points);
  const seebeck = adaptiveIntegral((x) => (x - eta) * weight(x), points) / f0;
  const mean = eta + seebeck;
  const lorenz = adaptiveIntegral((x) => (x - mean) * (x - mean) * weight(x), points) / f0;
  const fHalf = fermiHalfByWindow(eta);
  return { f0, fHalf, seebeck, lorenz, mobility: ((Math.sqrt(Math.PI) / 2) * f0) / fHalf };
}

/** η with F½(η) = target, by bisection on the window quadrature (F½ increases with η). */
export function reducedFermiLevel(target: number): number {
  let low = -60;
  let high = 60;
  while (fermiHalfByWindow(high) < target) high *= 2;
  if (fermiHalfByWindow(low) > target) throw new Error('reducedFermiLevel: below the bracket');
  while (high - low > 4e-15 * Math.max(1, Math.abs(high))) {
    const mid = 0.5 * (low + high);
    if (mid === low || mid === high) break;
    if (fermiHalfByWindow(mid) < target) low = mid;
    else high = mid;
  }
  return 0.5 * (low + high);
}
