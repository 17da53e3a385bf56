import { bandFamily } from './band-model';
import { parseCase } from './check-case';
import { gradedLeg } from './leg-profile';
import { optimizeLeg, solveLeg } from './run-case';
import { odexHotEnd } from './test-support/reference-leg';

// Ioffe's example leg (S = 200 µV/K, σ = 1e5 S/m, κ = 1.5 W/(m·K), 1 mm × 1 mm²).
const S = 200e-6;
const SIGMA = 1e5;
const KAPPA = 1.5;
const L = 1e-3;
const A = 1e-6;
const R = L / (SIGMA * A);
const K = (KAPPA * A) / L;
const TH = 300;
const uniform = { hotSide: TH, length: L, area: A, segments: [{ fraction: 1, seebeck: S, sigma: SIGMA, kappa: KAPPA }] };
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;

describe('contactResistivity absent or 0 changes nothing', () => {
  test('solve and optimize give identical results', () => {
    const graded = { hotSide: TH, length: L, area: A, material: band, doping: { x: [0, 0.5, 1], perCm3: [3e19, 1.5e19, 4e18] }, current: 3.5, heatLoad: 0.005 };
    expect(solveLeg(parseCase({ ...graded, contactResistivity: 0 }, 'solve'))).toEqual(solveLeg(parseCase(graded, 'solve')));
    const a = optimizeLeg(parseCase(uniform), { now: () => 0 });
    const b = optimizeLeg(parseCase({ ...uniform, contactResistivity: 0 }), { now: () => 0 });
    expect(b).toEqual(a);
    expect(parseCase({ ...uniform, contactResistivity: 0 })).toEqual(parseCase(uniform));
  });
});

describe('contacts against the closed forms with R replaced by R + Rc, Rc = 2ρc/A', () => {
  // Derivation (PHYSICS.md, "Contacts"): the cold contact's Joule heat
  // I²ρc/A is released at the cold junction and the hot one's at the hot
  // junction, so Qc = S·Tc·I − K·ΔT − I²R/2 − I²ρc/A = … − I²(R + Rc)/2 and
  // V = S·ΔT + I(R + Rc): Ioffe's closed forms (A. F. Ioffe, Semiconductor
  // Thermoelements and Thermoelectric Cooling, 1957) with R → R + Rc.
  const rc = 1e-9; // Ω·m², the poor end of the trade range
  const Rc = (2 * rc) / A;

  test('solve: Tc = (Qc + ½I²(R+Rc) + K·Th)/(S·I + K), V = I(R+Rc) + S·ΔT, energy balance', () => {
    for (const [current, heatLoad] of [
      [2, 0],
      [4, 0.03],
    ]) {
      const s = solveLeg(parseCase({ ...uniform, contactResistivity: rc, current, heatLoad }, 'solve'));
      const tc = (heatLoad + 0.5 * current * current * (R + Rc) + K * TH) / (S * current + K);
      expect(relative(s.coldSide, tc)).toBeLessThan(1e-12);
      expect(relative(s.voltage, current * (R + Rc) + S * (TH - tc))).toBeLessThan(1e-12);
      expect(relative(s.heatRejected - s.heatLoad, s.voltage * current)).toBeLessThan(1e-12);
      expect(s.accuracy.energyBalance).toBeLessThan(1e-12);
    }
  });

  test('optimize maxDeltaT: ΔTmax = Z′Tc²/2 at I = S·Tc/(R + Rc), Z′ = S²/(K(R + Rc)); both lower than with ideal contacts', () => {
    const Zc = (S * S) / (K * (R + Rc));
    const tc = (Math.sqrt(1 + 2 * Zc * TH) - 1) / Zc;
    const withContacts = optimizeLeg(parseCase({ ...uniform, contactResistivity: rc }));
    expect(relative(withContacts.deltaT, TH - tc)).toBeLessThan(1e-9);
    expect(withContacts.deltaT).toBeCloseTo((Zc * tc * tc) / 2, 7);
    expect(relative(withContacts.current, (S * tc) / (R + Rc))).toBeLessThan(1e-5);
    const ideal = optimizeLeg(parseCase(uniform));
    expect(ideal.deltaT).toBeCloseTo(70.3307, 4);
    expect(withContacts.deltaT).toBeLessThan(ideal.deltaT - 5);
    expect(withContacts.current).toBeLessThan(ideal.current);
  });

  test('optimize maxHeatLoad and maxCop at Tc = 270 K follow the same substitution', () => {
    const tc = 270;
    const dT = TH - tc;
    const Rt = R + Rc;
    const q = optimizeLeg(parseCase({ ...uniform, contactResistivity: rc, objective: 'maxHeatLoad', coldSide: tc }));
    expect(relative(q.current, (S * tc) / Rt)).toBeLessThan(1e-5);
    expect(relative(q.heatLoad, (S * S * tc * tc) / (2 * Rt) - K * dT)).toBeLessThan(1e-9);
    const M = Math.sqrt(1 + ((S * S) / (Rt * K)) * 0.5 * (tc + TH));
    const iCop = (S * dT) / (Rt * (M - 1));
    const qAtCop = S * tc * iCop - K * dT - 0.5 * iCop * iCop * Rt;
    const c = optimizeLeg(parseCase({ ...uniform, contactResistivity: rc, objective: 'maxCop', coldSide: tc, heatLoad: qAtCop }));
    expect(relative(c.current, iCop)).toBeLessThan(1e-7);
    expect(relative(c.cop as number, (tc * (M - TH / tc)) / (dT * (M + 1)))).toBeLessThan(1e-7);
  });
});

describe('contacts on a graded band-model leg against an independent integration', () => {
  test('solve agrees with odex with the contact jumps added by hand', () => {
    const rc = 5e-10;
    const current = 3.5;
    const heatLoad = 0.005;
    const doping = { x: [0, 0.5, 1], perCm3: [3e19, 1.5e19, 4e18] };
    const s = solveLeg(parseCase({ hotSide: TH, length: L, area: A, material: band, doping, current, heatLoad, contactResistivity: rc }, 'solve'));
    const family = bandFamily(band);
    const leg = gradedLeg(L, A, family, doping.x, doping.perCm3.map(Math.log10));
    const J = current / A;
    // odex (Gragg–Bulirsch–Stoer at 1e-13) on the bare leg: the heat entering it is Qc/A + J²ρc.
    const end = odexHotEnd(leg, J, s.coldSide, heatLoad / A + J * J * rc);
    expect(Math.abs(end.temperature - TH)).toBeLessThan(1e-8 * TH);
    expect(relative(s.heatRejected, (end.flux + J * J * rc) * A)).toBeLessThan(1e-8);
    expect(relative(s.voltage, end.voltage + 2 * J * rc)).toBeLessThan(1e-8);
    // And the contacts cost ΔT against the same leg without them.
    const ideal = solveLeg(parseCase({ hotSide: TH, length: L, area: A, material: band, doping, current, heatLoad }, 'solve'));
    expect(s.deltaT).toBeLessThan(ideal.deltaT);
  });

  test('a contactResistivity given in Ω·cm² by mistake is caught with a unit hint', () => {
    expect(() => parseCase({ ...uniform, contactResistivity: 1e-5 })).toThrow(/^contactResistivity: .*Ω·m²/);
    expect(() => parseCase({ ...uniform, contactResistivity: -1e-10 })).toThrow(/^contactResistivity: .*must not be negative/);
  });
});
