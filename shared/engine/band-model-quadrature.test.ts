/**
 * The band model (band-model.ts, tables in band-tables.ts) away from 300 K,
 * against direct quadrature that shares no code with the engine: adaptive
 * Gauss–Kronrod over the window −∂f/∂x and bisection for the reduced Fermi
 * level (test-support/fermi-quadrature.ts). band-tables.test.ts checks the
 * tables against the engine's own quadrature in the reduced variable u; this
 * file checks what a leg sees — S, σ, κ_e at a doping and a temperature,
 * through the temperature scalings and unit conversions — and the carrier
 * concentration that the engine's Fermi level implies.
 * Tolerance: band-tables.ts promises ~2e-10 against direct quadrature (the
 * worst found here: 1.0e-10 on S, 3e-11 on σ, 2.4e-11 on κ_e, 1.3e-10 on n);
 * we assert 5e-10 on every property.
 */
import { bandFamily, reducedConcentrationLog, type BandParameters } from './band-model';
import { bandFactors, U_HIGH, U_LOW } from './band-tables';
import type { Properties } from './material-family';
import { adaptiveIntegral, fermiHalfByWindow, gaussKronrod, reducedFermiLevel, transportByWindow } from './test-support/fermi-quadrature';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// CODATA 2018 (exact SI values, and the measured electron mass), typed here
// rather than imported so that a slip in constants.ts would show.
const K_B = 1.380649e-23;
const Q_E = 1.602176634e-19;
const H = 6.62607015e-34;
const M_E = 9.1093837015e-31;
const KE = K_B / Q_E;

describe('the reference quadrature itself', () => {
  test('the Gauss–Kronrod rule integrates polynomials exactly: degree ≤ 22 (15 points) and ≤ 13 (7 points)', () => {
    // ∫₋₁¹ x^{2k} dx = 2/(2k + 1); odd powers vanish by symmetry of the nodes.
    for (let k = 0; k <= 11; k++) {
      const r = gaussKronrod((x) => Math.pow(x, 2 * k), -1, 1);
      expect(Math.abs(r.kronrod - 2 / (2 * k + 1))).toBeLessThan(1e-15);
      if (2 * k <= 13) expect(Math.abs(r.gauss - 2 / (2 * k + 1))).toBeLessThan(1e-15);
    }
    // Degree 24 is beyond the Kronrod rule: the check above could fail.
    expect(Math.abs(gaussKronrod((x) => Math.pow(x, 24), -1, 1).kronrod - 2 / 25)).toBeGreaterThan(1e-10);
    expect(relative(adaptiveIntegral(Math.exp, [0, 1, 3]), Math.exp(3) - 1)).toBeLessThan(1e-15);
  });

  test('window moments agree with the exact Fermi–Dirac integrals', () => {
    // F₀(η) = ln(1 + e^η) for every η; at η = 0 F_j(0) = Γ(j+1)(1 − 2^{−j})ζ(j+1)
    // (NIST DLMF §25.12, F_j(η) = −Γ(j+1)·Li_{j+1}(−e^η)), so F½(0) =
    // (√π/2)(1 − 1/√2)ζ(3/2), F₁(0) = π²/12, F₂(0) = (3/2)ζ(3);
    // ζ(3/2) = 2.612375348685488 and ζ(3) = 1.202056903159594 (A&S Table 23.3, from memory).
    for (const eta of [-20, -3, 0, 2.5, 30]) {
      expect(relative(transportByWindow(eta).f0, Math.log1p(Math.exp(eta)))).toBeLessThan(2e-15);
    }
    const zero = transportByWindow(0);
    const zeta32 = 2.612375348685488;
    const zeta3 = 1.202056903159594;
    const ln2 = Math.LN2;
    expect(relative(zero.fHalf, (Math.sqrt(Math.PI) / 2) * (1 - Math.SQRT1_2) * zeta32)).toBeLessThan(1e-14);
    const mean = (Math.PI * Math.PI) / 6 / ln2; // 2F₁/F₀
    expect(relative(zero.seebeck, mean)).toBeLessThan(1e-14);
    expect(relative(zero.lorenz, (4.5 * zeta3) / ln2 - mean * mean)).toBeLessThan(1e-13);
    // Degenerate, η = 40: F₀ = η, F₁ = η²/2 + π²/6, F₂ = η³/3 + π²η/3 up to
    // e^(−η) ≈ 4e-18 (DLMF 25.12, the reflection of complete Fermi–Dirac
    // integrals), so S/(k/e) = π²/(3η) and L/(k/e)² = π²/3 − π⁴/(9η²) exactly.
    const eta = 40;
    const deg = transportByWindow(eta);
    expect(relative(deg.seebeck, (Math.PI * Math.PI) / (3 * eta))).toBeLessThan(1e-13);
    expect(relative(deg.lorenz, (Math.PI * Math.PI) / 3 - Math.pow(Math.PI, 4) / (9 * eta * eta))).toBeLessThan(1e-14);
    // Non-degenerate, η = −30: F_j = Γ(j+1)·e^η·(1 − e^η/2^{j+1} + …), so S/(k/e) = 2 − η and L/(k/e)² = 2 to ~1e-13.
    const nd = transportByWindow(-30);
    expect(relative(nd.seebeck, 32)).toBeLessThan(1e-13);
    expect(relative(nd.lorenz, 2)).toBeLessThan(1e-12);
    expect(relative(nd.fHalf, (Math.sqrt(Math.PI) / 2) * Math.exp(-30))).toBeLessThan(1e-12);
    // And the bisection inverts F½.
    expect(Math.abs(reducedFermiLevel(fermiHalfByWindow(3.7)) - 3.7)).toBeLessThan(1e-13);
  });
});

describe('band model at 150–600 K and 1e17–1e21 cm⁻³ against direct quadrature', () => {
  // A: holes, m* = 1, no lattice conduction (κ is κ_e alone).
  // B: electrons, a light band with other temperature exponents and a lattice part.
  const families: BandParameters[] = [
    { carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 0, latticeKappaExponent: -1 },
    { carrier: 'n', effectiveMass: 0.3, mobility300: 1200, mobilityExponent: -2.1, latticeKappa300: 1.3, latticeKappaExponent: -1.2 },
  ];
  const temperatures = [150, 250, 400, 600];
  const dopings = [1e17, 1e18, 1e19, 1e20, 1e21];

  test('S, σ, κ_e (and κ) to 5e-10, and the engine’s Fermi level gives back n to 5e-10', () => {
    const worst = { seebeck: 0, sigma: 0, electronicKappa: 0, kappa: 0, concentration: 0 };
    let inTable = 0;
    let beyondTable = 0;
    const out: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
    for (const p of families) {
      const family = bandFamily(p);
      const sign = p.carrier === 'p' ? 1 : -1;
      for (const T of temperatures) {
        // N(T) = 4π(2m*kT/h²)^{3/2} [m⁻³]: n = N·F½(η) (Nolas, Sharp, Goldsmid, ch. 2, from memory).
        const N = 4 * Math.PI * Math.pow((2 * p.effectiveMass * M_E * K_B * T) / (H * H), 1.5);
        const latticeKappa = p.latticeKappa300 * Math.pow(T / 300, p.latticeKappaExponent);
        const mu0 = p.mobility300 * 1e-4 * Math.pow(T / 300, p.mobilityExponent); // cm²/(V·s) → m²/(V·s)
        for (const perCm3 of dopings) {
          const n = perCm3 * 1e6;
          const eta = reducedFermiLevel(n / N);
          const ref = transportByWindow(eta);
          const sigma = n * Q_E * mu0 * ref.mobility;
          const electronicKappa = KE * KE * ref.lorenz * sigma * T;

          family.properties(Math.log10(perCm3), T, out);
          worst.seebeck = Math.max(worst.seebeck, relative(out.seebeck, sign * KE * ref.seebeck));
          worst.sigma = Math.max(worst.sigma, relative(out.sigma, sigma));
          worst.kappa = Math.max(worst.kappa, relative(out.kappa, latticeKappa + electronicKappa));
          // κ − κ_L cancels digits where the lattice dominates: scale by κ/κ_e.
          worst.electronicKappa = Math.max(worst.electronicKappa, (relative(out.kappa - latticeKappa, electronicKappa) * electronicKappa) / out.kappa);

          const u = reducedConcentrationLog(p, Math.log10(perCm3), T);
          if (u > U_HIGH || u < U_LOW) beyondTable++;
          else inTable++;
          worst.concentration = Math.max(worst.concentration, relative((N * fermiHalfByWindow(bandFactors(u).eta)) / 1e6, perCm3));
        }
      }
    }
    expect(worst.seebeck).toBeLessThan(5e-10);
    expect(worst.sigma).toBeLessThan(5e-10);
    expect(worst.electronicKappa).toBeLessThan(5e-10);
    expect(worst.kappa).toBeLessThan(5e-10);
    expect(worst.concentration).toBeLessThan(5e-10);
    // The grid covers both the tables and the degenerate expansion beyond them.
    expect(inTable).toBeGreaterThan(20);
    expect(beyondTable).toBeGreaterThan(0);
  });
});
