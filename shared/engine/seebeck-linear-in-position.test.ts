/**
 * An independent check of a graded leg: with S = S₀ + a·x along the leg and
 * constant σ, κ the leg equations are linear with constant coefficients and
 * have an exact solution in exponentials (or sines, for a < 0), against
 * which the engine's own solver is compared. The material is given to the
 * engine as a doping-controlled family over the leg's doping coordinate
 * (test-support/closed-form-families.ts), so the checked path is the graded
 * legs' path: sections, the integrator, shooting.
 *
 * Derivation, from the engine's equations (PHYSICS.md, "The leg"):
 *   q = S(x)·T·J − κT′,   dq/dx = J²/σ + J·S·T′.
 * Differentiating q: dq/dx = a·J·T + J·S·T′ − κT″, so
 *   κT″ = a·J·T − J²/σ,
 * the heat equation with the Thomson heat of a graded material, J·T·dS/dx
 * (absorbed where S rises along the current; e.g. H. J. Goldsmid,
 * Introduction to Thermoelectricity (Springer 2010), ch. 1, from memory).
 * With λ = a·J/κ and the particular solution T_p = J²/(σκλ) = J/(σ·a):
 *   T(x) = T_p + (Tc − T_p)·C(x) + T′(0)·Sn(x),   T′(0) = (S₀·Tc·J − q₀)/κ,
 * where C(x) = cosh(√λ·x), Sn(x) = sinh(√λ·x)/√λ for λ > 0 and
 * C(x) = cos(√−λ·x), Sn(x) = sin(√−λ·x)/√−λ for λ < 0 (so C′ = λ·Sn,
 * Sn′ = C, C(0) = 1, Sn(0) = 0). Then
 *   q(x) = S(x)·T(x)·J − κ·((Tc − T_p)·λ·Sn(x) + T′(0)·C(x)),
 *   V = ∫(J/σ + S·T′)dx = J·L/σ + S(L)·Th − S₀·Tc − a·∫₀ᴸT dx,
 *   ∫₀ᴸT dx = T_p·L + (Tc − T_p)·Sn(L) + T′(0)·(C(L) − 1)/λ.
 * T(L) is affine in Tc, so T(L) = Th gives Tc directly:
 *   Tc = (Th − T_p·(1 − C(L)) + q₀·Sn(L)/κ) / (C(L) + S₀·J·Sn(L)/κ).
 * Derived here (elementary: a linear equation with constant coefficients);
 * cross-checked at writing time against an 8th-order Runge–Kutta integration.
 */
import { positionLeg, seebeckLinearInPosition } from './test-support/closed-form-families';
import { ioffeColdSide } from './test-support/reference-leg';
import { solveLegProblem } from './solve-leg';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

type Graded = { s0: number; a: number; sigma: number; kappa: number; length: number; area: number };
type ClosedForm = { coldSide: number; hotFlux: number; voltage: number; temperature: (x: number) => number };

/** The closed form above: the leg at current density J with the hot end at Th and the cold-end flux q₀. */
function seebeckLinearInPositionLeg(g: Graded, J: number, hotSide: number, coldFlux: number): ClosedForm {
  const { s0, a, sigma, kappa, length: L } = g;
  const lambda = (a * J) / kappa;
  const m = Math.sqrt(Math.abs(lambda));
  const C = (x: number) => (lambda > 0 ? Math.cosh(m * x) : Math.cos(m * x));
  const Sn = (x: number) => (lambda > 0 ? Math.sinh(m * x) : Math.sin(m * x)) / m;
  const Tp = J / (sigma * a);
  const coldSide = (hotSide - Tp * (1 - C(L)) + (coldFlux * Sn(L)) / kappa) / (C(L) + (s0 * J * Sn(L)) / kappa);
  const slope0 = (s0 * coldSide * J - coldFlux) / kappa;
  const temperature = (x: number) => Tp + (coldSide - Tp) * C(x) + slope0 * Sn(x);
  const slope = (x: number) => (coldSide - Tp) * lambda * Sn(x) + slope0 * C(x);
  const hotS = s0 + a * L;
  const integralT = Tp * L + (coldSide - Tp) * Sn(L) + (slope0 * (C(L) - 1)) / lambda;
  return {
    coldSide,
    hotFlux: hotS * temperature(L) * J - kappa * slope(L),
    voltage: (J * L) / sigma + hotS * hotSide - s0 * coldSide - a * integralT,
    temperature,
  };
}

const base = { sigma: 1e5, kappa: 1.5, length: 1e-3, area: 1e-6 };
const cases: { g: Graded; current: number; heatLoad: number; hotSide: number }[] = [
  // S = a·x, from 0 at the cold end to 200 µV/K at the hot end.
  { g: { ...base, s0: 0, a: 0.2 }, current: 2, heatLoad: 0, hotSide: 300 },
  { g: { ...base, s0: 0, a: 0.2 }, current: 3.5, heatLoad: 0.005, hotSide: 300 },
  { g: { ...base, s0: 0, a: 0.2 }, current: 5, heatLoad: 0, hotSide: 320 },
  // 100 → 250 µV/K (λ > 0), and 250 → 150 µV/K (λ < 0: sines).
  { g: { ...base, s0: 100e-6, a: 0.15 }, current: 4, heatLoad: 0.01, hotSide: 300 },
  { g: { ...base, s0: 250e-6, a: -0.1 }, current: 4, heatLoad: 0.01, hotSide: 300 },
  { g: { ...base, s0: 250e-6, a: -0.1, length: 2e-3, area: 2e-6 }, current: 7, heatLoad: 0, hotSide: 310 },
];

describe('S = S₀ + a·x with constant σ and κ: the engine’s graded leg against the closed form', () => {
  test('given Th and Qc, Tc, Qh, V and T(x) agree within the solver’s target (1e-9), and to 1e-13 at a 1e-12 target', () => {
    for (const c of cases) {
      const exact = seebeckLinearInPositionLeg(c.g, c.current / c.g.area, c.hotSide, c.heatLoad / c.g.area);
      const leg = positionLeg(c.g.length, c.g.area, seebeckLinearInPosition(c.g.s0, c.g.a, c.g.length, c.g.sigma, c.g.kappa));
      for (const [tolerance, bound] of [
        [1e-9, 1e-9],
        [1e-12, 1e-13],
      ]) {
        const s = solveLegProblem({ leg, hotSide: c.hotSide, current: c.current, heatLoad: c.heatLoad }, { tolerance });
        expect(relative(s.coldSide, exact.coldSide)).toBeLessThan(bound);
        expect(relative(s.heatRejected, exact.hotFlux * c.g.area)).toBeLessThan(bound);
        expect(relative(s.voltage, exact.voltage)).toBeLessThan(bound);
        s.profile.x.forEach((x, i) => {
          expect(relative(s.profile.temperature[i], exact.temperature(x))).toBeLessThan(bound);
          // The profile reports the graded S at each point.
          expect(Math.abs(s.profile.seebeck[i] - (c.g.s0 + c.g.a * x))).toBeLessThan(1e-15);
        });
      }
    }
  });

  test('given Tc and Th, the heat load comes out as the closed form’s', () => {
    for (const c of cases) {
      const exact = seebeckLinearInPositionLeg(c.g, c.current / c.g.area, c.hotSide, c.heatLoad / c.g.area);
      const leg = positionLeg(c.g.length, c.g.area, seebeckLinearInPosition(c.g.s0, c.g.a, c.g.length, c.g.sigma, c.g.kappa));
      const s = solveLegProblem({ leg, hotSide: c.hotSide, current: c.current, coldSide: exact.coldSide }, { tolerance: 1e-12 });
      expect(Math.abs(s.heatLoad - c.heatLoad) / (exact.hotFlux * c.g.area)).toBeLessThan(1e-11);
      expect(relative(s.heatRejected, exact.hotFlux * c.g.area)).toBeLessThan(1e-11);
    }
  });

  test('an n-type graded leg (S = −(S₀ + a·x)) mirrors the p leg', () => {
    const c = cases[3];
    const exact = seebeckLinearInPositionLeg(c.g, c.current / c.g.area, c.hotSide, c.heatLoad / c.g.area);
    const leg = positionLeg(c.g.length, c.g.area, seebeckLinearInPosition(-c.g.s0, -c.g.a, c.g.length, c.g.sigma, c.g.kappa));
    const s = solveLegProblem({ leg, hotSide: c.hotSide, current: c.current, heatLoad: c.heatLoad }, { tolerance: 1e-12 });
    expect(relative(s.coldSide, exact.coldSide)).toBeLessThan(1e-11);
    expect(relative(s.voltage, exact.voltage)).toBeLessThan(1e-11);
    expect(s.voltage).toBeGreaterThan(0);
  });

  test('the check sees the grading: a uniform leg at the mean S misses Tc by far more than the tolerance', () => {
    // Ioffe's constant-property balance (A. F. Ioffe, 1957; see ioffeColdSide).
    for (const c of cases) {
      const exact = seebeckLinearInPositionLeg(c.g, c.current / c.g.area, c.hotSide, c.heatLoad / c.g.area);
      const ioffe = ioffeColdSide({ ...c.g, seebeck: c.g.s0 + 0.5 * c.g.a * c.g.length }, c.current, c.hotSide, c.heatLoad);
      expect(Math.abs(ioffe - exact.coldSide)).toBeGreaterThan(0.1);
    }
  });
});
