import { parseCase } from './check-case';
import { segmentedLeg } from './leg-profile';
import { optimizeLeg, type OptimizeResult } from './run-case';
import { solveLegProblem } from './solve-leg';
import { fractionsFrom, fractionsTo } from './optimize-segments';

/*
 * Segmented legs at small zT, S rising towards the hot end in N equal steps:
 * S_k = k·S1, σ_k = σ1/k², equal κ, so every section has the same Z.
 *
 * Common knowledge of the field (no source): with optimal section lengths
 * the maximum cooling rises by about 33 % (N = 2) to 78 % (N = 5) over a
 * uniform leg of the same Z; reversing the order loses cooling. Graded legs
 * beating ΔTmax = Z·Tc²/2 at equal Z is the claim of "Beating the maximum
 * cooling limit with graded thermoelectric materials", Appl. Phys. Lett. 89,
 * 212101 (2006).
 *
 * What "maximum cooling" means here, and the exact small-Z numbers. With
 * ZT ≪ 1, ΔT ≪ T, so to leading order the Peltier term uses T ≈ T0 and the
 * Thomson-like term J·S·T' is higher order; with Qc = 0, q(x) = J²∫₀ˣρ and
 * κT' = S(x)·T0·J − q(x), hence
 *   ΔT(J) = [T0·J·∫S dx − J²·∫ρ(x)(L − x)dx]/κ,
 *   ΔTmax = T0²(∫S dx)² / (4κ·∫ρ(x)(L − x)dx)        (uniform: Z·T0²/2).
 * (The largest heat load at ΔT = 0 is the same functional over L, so both
 * readings of "maximum cooling" give the same ratio.) With L = 1, y_k = the
 * distance of interface k from the hot end (y_0 = 1 > y_1 > … > y_N = 0):
 *   ∫S = S1·(1 + Σ_{k=1}^{N−1} y_k),  ∫ρ(1 − x) = ρ1·(1 + Σ_{k=1}^{N−1}(2k+1)y_k²)/2,
 *   ratio = (1 + Σ y_k)² / (1 + Σ (2k+1)y_k²).
 * Cauchy–Schwarz, (Σ a_k·b_k)² ≤ Σa_k²·Σb_k² with a_k = 1/√(2k+1),
 * b_k = √(2k+1)·y_k (k = 0 … N−1), bounds the ratio by Σ_{k=0}^{N−1} 1/(2k+1),
 * with equality at y_k = 1/(2k+1) — decreasing, so attainable. Hence
 *   N = 2: 4/3 = 1.3333 (+33.3 %),  N = 3: 1.5333,  N = 4: 1.6762,  N = 5: 1.7873 (+78.7 %),
 * confirming the quoted figures, at section fractions from the cold end
 * 2/3, 2/15, 2/35, …, and 1/(2N−1) for the hottest section.
 * Reversed (S_k = (N+1−k)·S1 from the cold end) with those lengths mirrored,
 * N = 2 gives (2 − 2/3)²/(4 − 3·(2/3)²) = 2/3 of the uniform leg; with free
 * lengths the reversed leg's best is the uniform leg itself (ratio 1, the
 * ratio (2 − y)²/(4 − 3y²) has its maximum 1 at y = 0 and y = 1).
 */
const S1 = 5e-6; // small: Z·T ≈ 5e-4, so O(ZT) corrections are ~0.05 %
const SIGMA1 = 1e5;
const KAPPA = 1.5;
const TH = 300;
const L = 1e-3;
const A = 1e-6;

const steps = (n: number) => Array.from({ length: n }, (_, i) => ({ fraction: 1 / n, seebeck: (i + 1) * S1, sigma: SIGMA1 / (i + 1) ** 2, kappa: KAPPA }));
const optimise = (segments: ReturnType<typeof steps>, freeFractions: boolean): OptimizeResult =>
  optimizeLeg(parseCase({ hotSide: TH, length: L, area: A, segments, freeFractions }, 'optimize'));
const uniformDeltaT = optimise(steps(1), false).deltaT;
const predicted = (n: number) => Array.from({ length: n }, (_, k) => 1 / (2 * k + 1)).reduce((a, b) => a + b, 0);
const optimalFractions = (n: number) => Array.from({ length: n }, (_, k) => (k === n - 1 ? 1 / (2 * n - 1) : 1 / (2 * k + 1) - 1 / (2 * k + 3)));

describe('segmented legs at small zT (S_k = k·S1, σ_k = σ1/k², equal κ)', () => {
  test('the uniform reference is Ioffe’s Z·Tc²/2', () => {
    const Z = (S1 * S1 * SIGMA1) / KAPPA;
    const tc = (Math.sqrt(1 + 2 * Z * TH) - 1) / Z;
    expect(uniformDeltaT).toBeCloseTo((Z * tc * tc) / 2, 9);
  });

  test.each([2, 3, 4, 5])('N = %i: optimised fractions beat the uniform leg by Σ 1/(2k+1), at fractions 2/3, 2/15, …', (n) => {
    const r = optimise(steps(n), true);
    const ratio = r.deltaT / uniformDeltaT;
    expect(Math.abs(ratio - predicted(n))).toBeLessThan(2e-3 * predicted(n));
    (r.segments ?? []).forEach((s, k) => expect(s.fraction).toBeCloseTo(optimalFractions(n)[k], 2));
  });

  test('the quoted figures: +33 % for N = 2 and +78 % for N = 5', () => {
    expect(predicted(2) - 1).toBeCloseTo(0.333, 3);
    expect(predicted(5) - 1).toBeCloseTo(0.787, 3);
  });

  test('reversing the order loses cooling: 2/3 of uniform at the mirrored lengths, no gain at the best lengths', () => {
    const reversed = steps(2).reverse();
    const mirrored = reversed.map((s, k) => ({ ...s, fraction: [1 / 3, 2 / 3][k] }));
    const atMirrored = optimise(mirrored, false).deltaT;
    expect(atMirrored / uniformDeltaT).toBeCloseTo(2 / 3, 2);
    const best = optimise(reversed, true).deltaT;
    expect(best / uniformDeltaT).toBeLessThan(1 + 2e-3);
    expect(best).toBeLessThan(optimise(steps(2), true).deltaT);
  });
});

describe('series composites: the effective Z never exceeds the best component’s', () => {
  // D. J. Bergman and O. Levy, "Thermoelectric properties of a composite
  // medium", J. Appl. Phys. 70, 6821 (1991). The composite's linear-response
  // coefficients are measured on the solved leg the way a lab would:
  // K from a small heat flow at I = 0, S from the open-circuit voltage of
  // that run, R from ±I at equal end temperatures (isothermal resistance;
  // the difference cancels the even-in-I Joule terms).
  const effectiveZ = (segments: { fraction: number; seebeck: number; sigma: number; kappa: number }[]) => {
    const leg = segmentedLeg(L, A, segments);
    const open = solveLegProblem({ leg, hotSide: TH, current: 0, heatLoad: 1e-6 });
    const dT = open.coldSide - TH;
    const K = 1e-6 / dT;
    const S = open.voltage / -dT;
    const i = 1e-3;
    const up = solveLegProblem({ leg, hotSide: TH, current: i, coldSide: TH });
    const down = solveLegProblem({ leg, hotSide: TH, current: -i, coldSide: TH });
    const R = (up.voltage * 1 - down.voltage * 1) / (2 * i);
    return (S * S) / (R * K);
  };

  test('equal-Z sections give a composite Z below that Z', () => {
    const z = (S1 * S1 * SIGMA1) / KAPPA;
    const zEff = effectiveZ(steps(3).map((s, k) => ({ ...s, fraction: [0.5, 0.3, 0.2][k] })));
    expect(zEff).toBeLessThan(z);
    expect(zEff).toBeGreaterThan(0.5 * z);
  });

  test('random two- to four-section composites never beat their best section', () => {
    let seed = 12345;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    for (let trial = 0; trial < 25; trial++) {
      const n = 2 + (trial % 3);
      const raw = Array.from({ length: n }, () => 0.2 + random());
      const total = raw.reduce((a, b) => a + b, 0);
      const segments = raw.map((w) => ({ fraction: w / total, seebeck: (50 + 250 * random()) * 1e-6, sigma: 2e4 + 2e5 * random(), kappa: 0.5 + 2 * random() }));
      const fix = segments.reduce((s, g) => s + g.fraction, 0);
      segments[n - 1].fraction += 1 - fix;
      const best = Math.max(...segments.map((s) => (s.seebeck * s.seebeck * s.sigma) / s.kappa));
      expect(effectiveZ(segments)).toBeLessThanOrEqual(best * (1 + 1e-9));
    }
  });
});

describe('stick-breaking fractions', () => {
  test('round-trip and always add up to 1', () => {
    const f = [0.5, 0.1, 0.15, 0.25];
    const t = fractionsTo(f);
    fractionsFrom(t).forEach((v, k) => expect(v).toBeCloseTo(f[k], 14));
    expect(fractionsFrom([0.3, 0.9, 0]).reduce((a, b) => a + b, 0)).toBeCloseTo(1, 15);
  });
});
