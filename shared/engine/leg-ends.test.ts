import { bandFamily } from './band-model';
import { parseCase } from './check-case';
import { STEFAN_BOLTZMANN } from './constants';
import { gradedLeg, type Leg } from './leg-profile';
import type { Properties } from './material-family';
import { optimizeLeg, solveLeg } from './run-case';
import { odexSolver } from './test-support/odex';

// Ioffe's example leg (S = 200 µV/K, σ = 1e5 S/m, κ = 1.5 W/(m·K), 1 mm × 1 mm²).
const S = 200e-6;
const SIGMA = 1e5;
const KAPPA = 1.5;
const L = 1e-3;
const A = 1e-6;
const R = L / (SIGMA * A); // 0.01 Ω
const K = (KAPPA * A) / L; // 1.5e-3 W/K
const TH = 300;
const uniform = { hotSide: TH, length: L, area: A, segments: [{ fraction: 1, seebeck: S, sigma: SIGMA, kappa: KAPPA }] };
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;

/*
 * Closed forms with a contact at each end and a fixed parasitic load Qp.
 * Between its junctions a constant-property leg obeys Ioffe's forms
 * (A. F. Ioffe, Semiconductor Thermoelements and Thermoelectric Cooling,
 * 1957): A·q(0⁺) = S·I·Tc − K·ΔT − ½I²R and A·q(L⁻) = S·I·Th − K·ΔT + ½I²R.
 * The cold junction passes the load's heat, the parasitic load and its own
 * Joule heat into the leg, A·q(0⁺) = Qc + Qp + I²ρc,cold/A; the hot junction
 * adds its Joule heat to the heat rejected, Qh = A·q(L⁻) + I²ρc,hot/A. So
 *
 *   Qc = S·I·Tc − K·ΔT − I²·a − Qp,   a = R/2 + ρc,cold/A,
 *   Qh = S·I·Th − K·ΔT + I²·(R/2 + ρc,hot/A),   V = S·ΔT + I·(R + (ρc,cold + ρc,hot)/A),
 *
 * the cooler-design treatment of contacts in D. M. Rowe (ed.), CRC Handbook
 * of Thermoelectrics (1995), chapter on cooler design (from memory), with
 * the parasitic load as a heat load that is not the user's. Only the cold
 * contact enters Qc: the hot contact's heat goes straight to the sink.
 * Largest ΔT (Qc = 0): Tc(I) = (K·Th + a·I² + Qp)/(S·I + K) is least where
 * a·S·I² + 2K·a·I − S·(K·Th + Qp) = 0. Largest Qc at fixed Tc: I = S·Tc/(2a),
 * Qc = S²Tc²/(4a) − K·ΔT − Qp.
 */
const rcCold = 1e-9;
const rcHot = 4e-10;
const qp = 2e-3; // W: e.g. gas conduction onto the cold end of one leg
const a = R / 2 + rcCold / A;

describe('contacts at each end and a fixed parasitic load against the closed forms', () => {
  const ends = { contactResistivity: { cold: rcCold, hot: rcHot }, parasitic: { heatLoad: qp } };

  test('solve: Tc, V, Qh from the closed forms; Qh − Qc − Qp = V·I', () => {
    for (const [current, heatLoad] of [
      [2, 0],
      [4, 0.03],
    ]) {
      const s = solveLeg(parseCase({ ...uniform, ...ends, current, heatLoad }, 'solve'));
      const tc = (heatLoad + qp + a * current * current + K * TH) / (S * current + K);
      const dT = TH - tc;
      expect(relative(s.coldSide, tc)).toBeLessThan(1e-12);
      expect(relative(s.voltage, S * dT + current * (R + (rcCold + rcHot) / A))).toBeLessThan(1e-12);
      expect(relative(s.heatRejected, S * current * TH - K * dT + current * current * (R / 2 + rcHot / A))).toBeLessThan(1e-12);
      expect(relative(s.power, s.voltage * current)).toBeLessThan(1e-12);
      expect(relative(s.heatRejected - s.heatLoad - qp, s.voltage * current)).toBeLessThan(1e-12);
      expect(s.accuracy.energyBalance).toBeLessThan(1e-12);
    }
  });

  test('the hot contact costs voltage but no ΔT: its heat goes to the sink', () => {
    const hotOnly = solveLeg(parseCase({ ...uniform, contactResistivity: { cold: 0, hot: 1e-9 }, current: 3, heatLoad: 0.01 }, 'solve'));
    const ideal = solveLeg(parseCase({ ...uniform, current: 3, heatLoad: 0.01 }, 'solve'));
    expect(Math.abs(hotOnly.deltaT - ideal.deltaT)).toBeLessThan(1e-12 * TH);
    expect(relative(hotOnly.voltage - ideal.voltage, (3 * 1e-9) / A)).toBeLessThan(1e-9);
  });

  test('optimize maxDeltaT: the least Tc of (K·Th + a·I² + Qp)/(S·I + K)', () => {
    const current = (-K * a + Math.sqrt(K * K * a * a + a * S * S * (K * TH + qp))) / (a * S);
    const tc = (K * TH + a * current * current + qp) / (S * current + K);
    const r = optimizeLeg(parseCase({ ...uniform, ...ends }));
    expect(relative(r.deltaT, TH - tc)).toBeLessThan(1e-9);
    expect(relative(r.current, current)).toBeLessThan(1e-5);
  });

  test('optimize maxHeatLoad at Tc = 270 K: I = S·Tc/(2a), Qc = S²Tc²/(4a) − K·ΔT − Qp', () => {
    const tc = 270;
    const r = optimizeLeg(parseCase({ ...uniform, ...ends, objective: 'maxHeatLoad', coldSide: tc }));
    expect(relative(r.current, (S * tc) / (2 * a))).toBeLessThan(1e-5);
    expect(relative(r.heatLoad, (S * S * tc * tc) / (4 * a) - K * (TH - tc) - qp)).toBeLessThan(1e-9);
  });

  test('a single contactResistivity is both ends; old cases and empty parasitic fields change nothing', () => {
    expect(parseCase({ ...uniform, contactResistivity: 5e-10 })).toEqual(parseCase({ ...uniform, contactResistivity: { cold: 5e-10, hot: 5e-10 } }));
    expect(parseCase({ ...uniform, contactResistivity: 0, parasitic: {} })).toEqual(parseCase(uniform));
    expect(parseCase({ ...uniform, parasitic: { heatLoad: 0, radiation: { emissivity: 0, surroundings: 300 } } })).toEqual(parseCase(uniform));
    expect(() => parseCase({ ...uniform, contactResistivity: { cold: 1e-5, hot: 0 } })).toThrow(/^contactResistivity\.cold: .*Ω·m²/);
    expect(() => parseCase({ ...uniform, parasitic: { radiation: { emissivity: 1.5, surroundings: 300 } } })).toThrow(/^parasitic\.radiation\.emissivity: /);
    expect(() => parseCase({ ...uniform, parasitic: { heatLoad: 20 } })).toThrow(/^parasitic\.heatLoad: .*watts per leg/);
  });
});

/**
 * The same leg equations with radiation onto the sides, integrated by odex
 * (Gragg–Bulirsch–Stoer, independent of the engine's integrator and
 * shooting) and a plain bisection on Tc:
 *   dT/dx = (S·T·J − q)/κ,  dq/dx = J²/σ + J·S·dT/dx + ε·σ_SB·(P/A)·(Ts⁴ − T⁴),
 * P = 4√A for a square cross-section, and the absorbed heat W alongside.
 */
function odexRadiating(leg: Leg, J: number, tc: number, coldFlux: number, emissivity: number, surroundings: number): { T: number; q: number; V: number; W: number } {
  const solver = odexSolver(4, 1e-13);
  const p: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
  const c = (emissivity * STEFAN_BOLTZMANN * 4 * Math.sqrt(leg.area)) / leg.area;
  let y = [tc, coldFlux, 0, 0];
  for (const s of leg.sections) {
    const slope = (s.log10End - s.log10Start) / (s.end - s.start);
    const f = (x: number, state: number[]) => {
      s.family.properties(s.log10Start + slope * (x - s.start), state[0], p);
      const dT = (p.seebeck * state[0] * J - state[1]) / p.kappa;
      const source = c * (surroundings ** 4 - state[0] ** 4);
      return [dT, (J * J) / p.sigma + J * p.seebeck * dT + source, J / p.sigma + p.seebeck * dT, source];
    };
    const r = solver.solve(f, s.start, y, s.end);
    if (r.outcome !== 0) throw new Error(`odex did not converge (outcome ${r.outcome})`);
    y = r.y;
  }
  return { T: y[0], q: y[1], V: y[2], W: y[3] };
}

function odexColdSide(leg: Leg, J: number, coldFlux: number, emissivity: number, surroundings: number): number {
  let lo = 100;
  let hi = TH;
  const gap = (tc: number) => odexRadiating(leg, J, tc, coldFlux, emissivity, surroundings).T - TH;
  const gLo = gap(lo);
  for (let k = 0; k < 60; k++) {
    const m = 0.5 * (lo + hi);
    if (Math.sign(gap(m)) === Math.sign(gLo)) lo = m;
    else hi = m;
  }
  return 0.5 * (lo + hi);
}

describe('radiation onto the sides against an independent odex integration', () => {
  const doping = { x: [0, 0.5, 1], perCm3: [3e19, 1.5e19, 4e18] };
  const current = 3.5;
  const heatLoad = 0.005;
  const graded = { hotSide: TH, length: 1.5e-3, area: A, material: band, doping, current, heatLoad };
  const leg = gradedLeg(1.5e-3, A, bandFamily(band), doping.x, doping.perCm3.map(Math.log10));

  test.each([
    ['a small emissivity, surroundings at the sink', 0.05, TH],
    ['a black leg in warm surroundings', 1, 330],
  ])('%s: Tc, Qh, V and the absorbed heat agree', (_name, emissivity, surroundings) => {
    const s = solveLeg(parseCase({ ...graded, parasitic: { radiation: { emissivity, surroundings } } }, 'solve'));
    const J = current / A;
    const tc = odexColdSide(leg, J, heatLoad / A, emissivity, surroundings);
    expect(Math.abs(s.coldSide - tc)).toBeLessThan(1e-8 * TH);
    const end = odexRadiating(leg, J, s.coldSide, heatLoad / A, emissivity, surroundings);
    expect(relative(s.heatRejected, end.q * A)).toBeLessThan(1e-8);
    expect(relative(s.voltage, end.V)).toBeLessThan(1e-8);
    // Energy: Qh − Qc − absorbed = V·I, with the absorbed heat from odex.
    expect(relative(s.heatRejected - s.heatLoad - end.W * A, s.voltage * current)).toBeLessThan(1e-7);
    expect(s.accuracy.energyBalance).toBeLessThan(1e-8);
    const ideal = solveLeg(parseCase(graded, 'solve'));
    // Heat gained from warmer surroundings is pumped too: the leg holds less ΔT.
    expect(s.deltaT).toBeLessThan(ideal.deltaT);
  });

  test('surroundings colder than the leg cool it: ΔT grows', () => {
    const s = solveLeg(parseCase({ ...graded, parasitic: { radiation: { emissivity: 1, surroundings: 77 } } }, 'solve'));
    expect(s.deltaT).toBeGreaterThan(solveLeg(parseCase(graded, 'solve')).deltaT);
  });

  test('small ε: ΔT falls linearly in ε (the first-order term of the same equations)', () => {
    const at = (emissivity: number) => solveLeg(parseCase({ ...graded, parasitic: { radiation: { emissivity, surroundings: TH } } }, 'solve')).deltaT;
    const d0 = solveLeg(parseCase(graded, 'solve')).deltaT;
    const d1 = d0 - at(0.01);
    const d2 = d0 - at(0.02);
    expect(d1).toBeGreaterThan(0);
    expect(Math.abs(d2 / d1 - 2)).toBeLessThan(1e-3);
  });

  test('a constant leg: the absorbed heat matches the integral over the exact parabola for tiny ε', () => {
    // At ε → 0 the profile is Ioffe's parabola; the heat absorbed is
    // ε·σ_SB·P·∫(Ts⁴ − T(x)⁴)dx over it (midpoint rule, 2000 points).
    const eps = 1e-6;
    const s = solveLeg(parseCase({ ...uniform, current: 3, heatLoad: 0, parasitic: { radiation: { emissivity: eps, surroundings: TH } } }, 'solve'));
    const ideal = solveLeg(parseCase({ ...uniform, current: 3, heatLoad: 0 }, 'solve'));
    const J = 3 / A;
    const tc = ideal.coldSide;
    const slope0 = (S * tc * J - 0) / KAPPA;
    const T = (x: number) => tc + slope0 * x - (J * J * x * x) / (2 * SIGMA * KAPPA);
    let integral = 0;
    const n = 2000;
    for (let k = 0; k < n; k++) integral += (TH ** 4 - T(((k + 0.5) * L) / n) ** 4) * (L / n);
    const absorbed = eps * STEFAN_BOLTZMANN * 4 * Math.sqrt(A) * integral;
    expect(relative(s.heatRejected - s.heatLoad - s.power, absorbed)).toBeLessThan(1e-4);
  });
});
