/**
 * An independent check of a temperature-dependent Seebeck coefficient: with
 * S = b·T and constant σ, κ the leg equations have an exact solution in Airy
 * functions, against which the engine's own solver (shooting on its
 * Dormand–Prince integration) is compared.
 *
 * Derivation, from the engine's equations (PHYSICS.md, "The leg"):
 *   q = S·T·J − κT′ = b·J·T² − κT′,   dq/dx = J²/σ + J·S·T′ = J²/σ + b·J·T·T′.
 * Differentiating q and equating, κT″ = b·J·T·T′ − J²/σ: the usual heat
 * equation with Thomson heat, κT″ + J²/σ − τ·J·T′ = 0, for the Thomson
 * coefficient τ = T·dS/dT = b·T (Kelvin's relation; e.g. H. J. Goldsmid,
 * Introduction to Thermoelectricity (Springer 2010), ch. 1, from memory). It
 * is nonlinear in T, but
 * (1) q − (bJ/2)·T² − (J²/σ)·x is constant along the leg (its derivative is
 *     J²/σ + bJTT′ − bJTT′ − J²/σ = 0), so with q₀ = q(0), Tc = T(0):
 *     q(x) = q₀ + (bJ/2)(T² − Tc²) + J²x/σ;
 * (2) dV/dx = J/σ + S·T′ = J/σ + (b/2)(T²)′, so V = J·L/σ + (b/2)(Th² − Tc²);
 * (3) from q = bJT² − κT′ and (1): T′ = α·T² + (C − J²x/σ)/κ with
 *     α = bJ/(2κ), C = (bJ/2)·Tc² − q₀ — a Riccati equation. Put
 *     T = −u′/(α·u): then T′ = −u″/(α·u) + α·T², hence
 *     u″ = k³·(x − x₀)·u with k³ = α·J²/(σκ) = b·J³/(2σκ²), x₀ = C·σ/J².
 *     In z = k·(x − x₀) this is Airy's equation d²u/dz² = z·u
 *     (M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions
 *     (1964), 10.4.1), so u = Ai(z) + c·Bi(z) and
 *       T(x) = −(k/α)·(Ai′(z) + c·Bi′(z)) / (Ai(z) + c·Bi(z)),
 *     with c fixed by T(0) = Tc at z₀ = −k·x₀:
 *       c = −(Tc·Ai(z₀) + (k/α)·Ai′(z₀)) / (Tc·Bi(z₀) + (k/α)·Bi′(z₀)).
 *     (The linearising substitution of a Riccati equation: E. L. Ince,
 *     Ordinary Differential Equations (1926), §2.15, from memory.) In the
 *     cooling direction b·J > 0 for either carrier, so k is real.
 * We know of no published source for this closed form; it is derived here,
 * and cross-checked at writing time against SciPy's Airy functions and an
 * 8th-order Runge–Kutta integration (agreement ~1e-13).
 */
import { airy, AIRY_MAX_ARGUMENT } from './test-support/airy';
import { seebeckLinearInTemperature } from './test-support/closed-form-families';
import { ioffeColdSide } from './test-support/reference-leg';
import { uniformLeg } from './leg-profile';
import { solveLegProblem } from './solve-leg';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('Airy functions of the test support', () => {
  test('match A&S Table 10.11 to its 10 digits', () => {
    // M. Abramowitz and I. A. Stegun, Handbook of Mathematical Functions
    // (NBS 1964), Table 10.11 (values quoted to 10 significant digits; confirmed
    // against mpmath at 30 digits when this test was written).
    const table: [number, number, number, number, number][] = [
      // x, Ai(x), Ai′(x), Bi(x), Bi′(x)
      [0, 0.3550280539, -0.2588194038, 0.6149266274, 0.4482883574],
      [0.5, 0.2316936065, -0.2249105327, 0.8542770431, 0.5445725641],
      [1, 0.1352924163, -0.1591474413, 1.207423595, 0.9324359334],
      [-1, 0.5355608833, -0.01016056712, 0.1039973895, 0.5923756264],
      [-2, 0.2274074282, 0.6182590207, -0.4123025880, 0.2787951669],
      [-2.5, -0.1123250677, 0.6788527343, -0.4324224718, -0.2204201549],
    ];
    for (const [x, ai, aiPrime, bi, biPrime] of table) {
      const a = airy(x);
      expect(relative(a.ai, ai)).toBeLessThan(1e-9);
      expect(relative(a.aiPrime, aiPrime)).toBeLessThan(1e-9);
      expect(relative(a.bi, bi)).toBeLessThan(1e-9);
      expect(relative(a.biPrime, biPrime)).toBeLessThan(1e-9);
    }
  });

  test('satisfy the Wronskian Ai·Bi′ − Ai′·Bi = 1/π over the whole range used', () => {
    // A&S 10.4.10.
    for (let z = -AIRY_MAX_ARGUMENT; z <= AIRY_MAX_ARGUMENT; z += 0.125) {
      const a = airy(z);
      expect(Math.abs(a.ai * a.biPrime - a.aiPrime * a.bi - 1 / Math.PI)).toBeLessThan(1e-13);
    }
    expect(() => airy(3.5)).toThrow(/beyond/);
  });
});

type Material = { b: number; sigma: number; kappa: number };
type ClosedForm = { hotSide: number; hotFlux: number; voltage: number; temperature: (x: number) => number };

/** The closed form above: the leg's state from its cold end (Tc, q₀) at current density J. */
function seebeckLinearInTemperatureLeg(m: Material, J: number, length: number, coldSide: number, coldFlux: number): ClosedForm {
  const { b, sigma, kappa } = m;
  const alpha = (b * J) / (2 * kappa);
  const k = Math.cbrt((b * J * J * J) / (2 * sigma * kappa * kappa));
  const x0 = ((0.5 * b * J * coldSide * coldSide - coldFlux) * sigma) / (J * J);
  const scale = k / alpha;
  const a0 = airy(-k * x0);
  const c = -(coldSide * a0.ai + scale * a0.aiPrime) / (coldSide * a0.bi + scale * a0.biPrime);
  const temperature = (x: number) => {
    const a = airy(k * (x - x0));
    return (-scale * (a.aiPrime + c * a.biPrime)) / (a.ai + c * a.bi);
  };
  const hotSide = temperature(length);
  const delta = hotSide * hotSide - coldSide * coldSide;
  return {
    hotSide,
    hotFlux: coldFlux + 0.5 * b * J * delta + (J * J * length) / sigma,
    voltage: (J * length) / sigma + 0.5 * b * delta,
    temperature,
  };
}

describe('S = b·T with constant σ and κ: the engine against the Airy closed form', () => {
  // S = 200 µV/K at 300 K (Thomson coefficient 200 µV/K there too), the
  // engine's worked example's σ and κ; the last leg is longer, less
  // conductive and has twice the slope, for a strong Thomson effect.
  const cases = [
    { m: { b: 200e-6 / 300, sigma: 1e5, kappa: 1.5 }, length: 1e-3, area: 1e-6, current: 2, coldSide: 240, heatLoad: 0.01 },
    { m: { b: 200e-6 / 300, sigma: 1e5, kappa: 1.5 }, length: 1e-3, area: 1e-6, current: 4, coldSide: 220, heatLoad: 0 },
    { m: { b: 200e-6 / 300, sigma: 1e5, kappa: 1.5 }, length: 1e-3, area: 1e-6, current: 7, coldSide: 230, heatLoad: 0.02 },
    { m: { b: 400e-6 / 300, sigma: 4e4, kappa: 1.2 }, length: 2.5e-3, area: 2e-6, current: 3, coldSide: 190, heatLoad: 0.004 },
  ];

  test('given Th and Qc, Tc, Qh, V and T(x) agree within the solver’s target (1e-9), and to 1e-13 at a 1e-12 target', () => {
    for (const c of cases) {
      const J = c.current / c.area;
      const exact = seebeckLinearInTemperatureLeg(c.m, J, c.length, c.coldSide, c.heatLoad / c.area);
      const leg = uniformLeg(c.length, c.area, seebeckLinearInTemperature(c.m.b, c.m.sigma, c.m.kappa), 0);
      for (const [tolerance, bound] of [
        [1e-9, 1e-9],
        [1e-12, 1e-13],
      ]) {
        const s = solveLegProblem({ leg, hotSide: exact.hotSide, current: c.current, heatLoad: c.heatLoad }, { tolerance });
        expect(relative(s.coldSide, c.coldSide)).toBeLessThan(bound);
        expect(relative(s.heatRejected, exact.hotFlux * c.area)).toBeLessThan(bound);
        expect(relative(s.voltage, exact.voltage)).toBeLessThan(bound);
        s.profile.x.forEach((x, i) => expect(relative(s.profile.temperature[i], exact.temperature(x))).toBeLessThan(bound));
        // And the profile's S is b·T along it.
        expect(relative(s.profile.seebeck[s.profile.x.length - 1], c.m.b * exact.hotSide)).toBeLessThan(bound);
      }
    }
  });

  test('given Tc and Th, the heat load comes out as the closed form’s', () => {
    for (const c of cases) {
      const J = c.current / c.area;
      const exact = seebeckLinearInTemperatureLeg(c.m, J, c.length, c.coldSide, c.heatLoad / c.area);
      const leg = uniformLeg(c.length, c.area, seebeckLinearInTemperature(c.m.b, c.m.sigma, c.m.kappa), 0);
      const s = solveLegProblem({ leg, hotSide: exact.hotSide, current: c.current, coldSide: c.coldSide }, { tolerance: 1e-12 });
      // Qc may be 0: measure its error against the heat rejected.
      expect(Math.abs(s.heatLoad - c.heatLoad) / (exact.hotFlux * c.area)).toBeLessThan(1e-11);
      expect(relative(s.heatRejected, exact.hotFlux * c.area)).toBeLessThan(1e-11);
    }
  });

  test('an n-type leg (S = −b·T, current in its cooling direction) gives the same temperatures and a positive voltage', () => {
    const c = cases[2];
    const exact = seebeckLinearInTemperatureLeg(c.m, c.current / c.area, c.length, c.coldSide, c.heatLoad / c.area);
    // In the n leg J = −I/A and S = −b·T: b·J and b·J³ are unchanged, so is T(x).
    const leg = uniformLeg(c.length, c.area, seebeckLinearInTemperature(-c.m.b, c.m.sigma, c.m.kappa), 0);
    const s = solveLegProblem({ leg, hotSide: exact.hotSide, current: c.current, heatLoad: c.heatLoad }, { tolerance: 1e-12 });
    expect(relative(s.coldSide, c.coldSide)).toBeLessThan(1e-11);
    expect(relative(s.voltage, exact.voltage)).toBeLessThan(1e-11);
    expect(s.voltage).toBeGreaterThan(0);
  });

  test('the check sees the Thomson heat: a constant S at the mean temperature misses Tc by far more than the tolerance', () => {
    // Ioffe's constant-property balance (A. F. Ioffe, 1957; see ioffeColdSide).
    for (const c of cases) {
      const exact = seebeckLinearInTemperatureLeg(c.m, c.current / c.area, c.length, c.coldSide, c.heatLoad / c.area);
      const seebeck = c.m.b * 0.5 * (c.coldSide + exact.hotSide);
      const ioffe = ioffeColdSide({ ...c.m, seebeck, length: c.length, area: c.area }, c.current, exact.hotSide, c.heatLoad);
      expect(Math.abs(ioffe - c.coldSide)).toBeGreaterThan(0.1);
    }
  });
});
