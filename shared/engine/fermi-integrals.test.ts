import { fermiIntegral, fermiIntegralsByQuadrature, fermiZero } from './fermi-integrals';

const ZETA_3_2 = 2.612375348685488; // ζ(3/2)
const ZETA_3 = 1.2020569031595942; // ζ(3), Apéry's constant
const gammaThreeHalves = Math.sqrt(Math.PI) / 2;

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('Fermi–Dirac integrals by quadrature', () => {
  test.each([-30, -5, -0.5, 0, 0.7, 3, 15, 40, 80])('F0(%p) = ln(1 + e^η) exactly', (eta) => {
    // Closed form: ∫ dx/(1+e^(x−η)) = ln(1+e^η) (elementary integral).
    expect(relative(fermiIntegral(0, eta), Math.log1p(Math.exp(eta)))).toBeLessThan(1e-13);
    expect(relative(fermiZero(eta), Math.log1p(Math.exp(eta)))).toBeLessThan(1e-15);
  });

  test('F_j(0) = (1 − 2^−j)·Γ(j+1)·ζ(j+1)  (F_j(η) = −Γ(j+1)·Li_(j+1)(−e^η) and the Dirichlet eta function; NIST DLMF §25.12 and §25.2, from memory)', () => {
    expect(relative(fermiIntegral(0.5, 0), (1 - Math.SQRT1_2) * gammaThreeHalves * ZETA_3_2)).toBeLessThan(1e-13);
    expect(relative(fermiIntegral(1, 0), (Math.PI * Math.PI) / 12)).toBeLessThan(1e-13);
    expect(relative(fermiIntegral(2, 0), 1.5 * ZETA_3)).toBeLessThan(1e-13);
    // The normalised ℱ½(0) = F½(0)/Γ(3/2) = 0.765147 is the tabulated value in
    // J. S. Blakemore, Solid-State Electronics 25, 1067 (1982) (from memory).
    expect(fermiIntegral(0.5, 0) / gammaThreeHalves).toBeCloseTo(0.765147, 6);
  });

  test.each([-1, 0.3, 2, 7.5, 25, 60])('reflection identities of F1 and F2 hold at η = %p (polylogarithm inversion)', (eta) => {
    // F1(η) = −Li2(−e^η), F2(η) = −2·Li3(−e^η); the inversion formulas of Li2 and
    // Li3 (L. Lewin, Polylogarithms and Associated Functions, 1981) give
    // F1(η) + F1(−η) = η²/2 + π²/6 and F2(η) − F2(−η) = η³/3 + π²η/3 exactly.
    const pi2 = Math.PI * Math.PI;
    const [f1, f2] = fermiIntegralsByQuadrature(eta, [1, 2]);
    const [g1, g2] = fermiIntegralsByQuadrature(-eta, [1, 2]);
    expect(relative(f1 + g1, (eta * eta) / 2 + pi2 / 6)).toBeLessThan(1e-13);
    expect(Math.abs(f2 - g2 - (eta ** 3 / 3 + (pi2 * eta) / 3)) / (eta ** 3 / 3 + pi2 * Math.abs(eta))).toBeLessThan(1e-13);
  });

  test('non-degenerate limit F_j(η) → Γ(j+1)·e^η', () => {
    const eta = -30;
    expect(relative(fermiIntegral(0.5, eta), gammaThreeHalves * Math.exp(eta))).toBeLessThan(1e-12);
    expect(relative(fermiIntegral(2, eta), 2 * Math.exp(eta))).toBeLessThan(1e-12);
  });

  test('derivative identity dF_j/dη = j·F_(j−1) (differentiation under the integral)', () => {
    for (const eta of [-3, 0, 4, 20]) {
      const h = 1e-3;
      // Fourth-order central difference.
      const d = (-fermiIntegral(0.5, eta + 2 * h) + 8 * fermiIntegral(0.5, eta + h) - 8 * fermiIntegral(0.5, eta - h) + fermiIntegral(0.5, eta - 2 * h)) / (12 * h);
      expect(relative(d, 0.5 * fermiIntegral(-0.5, eta))).toBeLessThan(1e-10);
    }
  });

  test('rejects orders at or below −1, where the integral diverges', () => {
    expect(() => fermiIntegral(-1, 0)).toThrow(/order/);
  });
});
