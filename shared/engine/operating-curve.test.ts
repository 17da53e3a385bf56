import { bandFamily } from './band-model';
import { CaseError } from './case-error';
import { legFromDefinition, operatingCurve, type LegDefinition } from './module';
import { odexHotEnd } from './test-support/reference-leg';

// Constant properties: the worked example of the issue, S = 200 µV/K,
// σ = 1e5 S/m, κ = 1.5 W/(m·K), L = 1 mm, A = 1 mm².
const S = 200e-6;
const SIGMA = 1e5;
const KAPPA = 1.5;
const L = 1e-3;
const A = 1e-6;
const R = L / (SIGMA * A); // 0.01 Ω
const K = (KAPPA * A) / L; // 1.5e-3 W/K
const TH = 300;
const constantLeg = (contactResistivity?: number): LegDefinition => ({
  length: L,
  area: A,
  leg: { kind: 'segments', segments: [{ fraction: 1, seebeck: S, sigma: SIGMA, kappa: KAPPA }] },
  ...(contactResistivity !== undefined ? { ends: { contacts: { cold: contactResistivity, hot: contactResistivity } } } : {}),
});
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/**
 * Ioffe's closed forms for a leg of constant properties between junctions at
 * Tc and Th (A. F. Ioffe, Semiconductor Thermoelements and Thermoelectric
 * Cooling, Infosearch 1957; also CRC Handbook of Thermoelectrics, ed.
 * D. M. Rowe, 1995, ch. 19): Qc = S·Tc·I − K·ΔT − I²R/2, P = S·ΔT·I + I²R,
 * V = S·ΔT + I·R; maximum Qc at I = S·Tc/R; maximum COP
 * Tc(M − Th/Tc)/(ΔT(M + 1)) at I = S·ΔT/(R(M − 1)), M = √(1 + Z·Tm).
 */
function closedForm(resistance: number, tc: number) {
  const dT = TH - tc;
  const Z = (S * S) / (resistance * K);
  const M = Math.sqrt(1 + Z * 0.5 * (tc + TH));
  const disc = Math.sqrt(S * S * tc * tc - 2 * resistance * K * dT);
  return {
    heatLoad: (I: number) => S * tc * I - K * dT - 0.5 * I * I * resistance,
    power: (I: number) => S * dT * I + I * I * resistance,
    voltage: (I: number) => S * dT + I * resistance,
    range: [(S * tc - disc) / resistance, (S * tc + disc) / resistance],
    iMaxHeatLoad: (S * tc) / resistance,
    maxHeatLoad: (S * S * tc * tc) / (2 * resistance) - K * dT,
    iMaxCop: (S * dT) / (resistance * (M - 1)),
    maxCop: (tc * (M - TH / tc)) / (dT * (M + 1)),
  };
}

describe('operating curve of a constant-property leg against the closed forms (Ioffe 1957)', () => {
  test.each([
    ['ΔT = 20 K', 280],
    ['ΔT = 50 K', 250],
  ])('%s: Qc, P, V at every sampled current; pumping range; currents and values of maximum Qc and COP', (_name, tc) => {
    const curve = operatingCurve(constantLeg(), { hotSide: TH, coldSide: tc }, { points: 25 });
    const f = closedForm(R, tc);
    expect(curve.currents).toHaveLength(25);
    const qScale = f.maxHeatLoad;
    curve.currents.forEach((I, k) => {
      expect(Math.abs(curve.heatLoad[k] - f.heatLoad(I)) / qScale).toBeLessThan(1e-12);
      expect(relative(curve.power[k], f.power(I))).toBeLessThan(1e-12);
      expect(relative(curve.voltage[k], f.voltage(I))).toBeLessThan(1e-12);
      // Energy balance: Qh − Qc = P = V·I.
      expect(relative(curve.heatRejected[k] - curve.heatLoad[k], curve.power[k])).toBeLessThan(1e-10);
    });
    // The curves start and end where Qc = 0: the roots of the quadratic.
    expect(relative(curve.pumpingRange[0], f.range[0])).toBeLessThan(1e-8);
    expect(relative(curve.pumpingRange[1], f.range[1])).toBeLessThan(1e-8);
    expect(curve.currents[0]).toBe(curve.pumpingRange[0]);
    expect(curve.currents[24]).toBe(curve.pumpingRange[1]);
    // The marked currents come from the optimiser, not from the samples.
    expect(relative(curve.maxHeatLoad.current, f.iMaxHeatLoad)).toBeLessThan(1e-5);
    expect(relative(curve.maxHeatLoad.heatLoad, f.maxHeatLoad)).toBeLessThan(1e-11);
    const cop = curve.maxCop;
    expect(cop).not.toBeNull();
    expect(relative(cop?.current ?? NaN, f.iMaxCop)).toBeLessThan(1e-5);
    expect(relative(cop?.cop ?? NaN, f.maxCop)).toBeLessThan(1e-10);
    expect(cop?.heatLoad).toBeCloseTo(f.heatLoad(cop?.current ?? NaN), 12);
    expect(curve.warnings).toEqual([]);
  });

  test('ΔT = 0: the range starts at I = 0, Qc,max = S²Th²/(2R) at I = S·Th/R, and there is no maximum COP', () => {
    const curve = operatingCurve(constantLeg(), { hotSide: TH, deltaT: 0 });
    expect(curve.pumpingRange[0]).toBe(0);
    expect(relative(curve.pumpingRange[1], (2 * S * TH) / R)).toBeLessThan(1e-8);
    expect(relative(curve.maxHeatLoad.current, (S * TH) / R)).toBeLessThan(1e-5);
    expect(relative(curve.maxHeatLoad.heatLoad, (S * S * TH * TH) / (2 * R))).toBeLessThan(1e-11);
    expect(curve.maxCop).toBeNull();
    expect(curve.cop[0]).toBeNull();
    expect(curve.warnings.join(' ')).toMatch(/no current of maximum COP/);
  });

  test('contact resistance: the same closed forms with R → R + 2ρc/A (derived in PHYSICS.md, "Contacts")', () => {
    const rc = 1e-9; // Ω·m² per junction: 1 mΩ at each end of a 1 mm² leg
    const Rc = (2 * rc) / A;
    const curve = operatingCurve(constantLeg(rc), { hotSide: TH, coldSide: 270 }, { points: 15 });
    const f = closedForm(R + Rc, 270);
    const ideal = operatingCurve(constantLeg(), { hotSide: TH, coldSide: 270 }, { points: 15 });
    curve.currents.forEach((I, k) => {
      expect(Math.abs(curve.heatLoad[k] - f.heatLoad(I)) / f.maxHeatLoad).toBeLessThan(1e-12);
      expect(relative(curve.voltage[k], f.voltage(I))).toBeLessThan(1e-12);
    });
    expect(relative(curve.maxHeatLoad.current, f.iMaxHeatLoad)).toBeLessThan(1e-5);
    expect(relative(curve.maxCop?.cop ?? NaN, f.maxCop)).toBeLessThan(1e-10);
    // Contacts lower the optimum current, the largest heat load and the best COP.
    expect(curve.maxHeatLoad.current).toBeLessThan(ideal.maxHeatLoad.current);
    expect(curve.maxHeatLoad.heatLoad).toBeLessThan(ideal.maxHeatLoad.heatLoad);
    expect(curve.maxCop?.cop ?? NaN).toBeLessThan(ideal.maxCop?.cop ?? NaN);
  });

  test('a current limit flags the samples and marked points above it', () => {
    const curve = operatingCurve(constantLeg(), { hotSide: TH, deltaT: 20 }, { currentLimit: 4 });
    expect(curve.currentLimit).toBe(4);
    curve.currents.forEach((I, k) => expect(curve.overLimit[k]).toBe(I > 4));
    expect(curve.overLimit.some(Boolean)).toBe(true);
    expect(curve.maxHeatLoad.overLimit).toBe(true); // 5.6 A
    expect(curve.maxCop?.overLimit).toBe(false); // 1.2 A
    const free = operatingCurve(constantLeg(), { hotSide: TH, deltaT: 20 });
    expect(free.currentLimit).toBeNull();
    expect(free.overLimit.every((v) => !v)).toBe(true);
  });

  test('a ΔT the leg cannot hold is an error naming the field that set it', () => {
    // ΔTmax = 70.33 K for this leg (Ioffe's example).
    const err = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return e;
      }
      return undefined;
    };
    const byDeltaT = err(() => operatingCurve(constantLeg(), { hotSide: TH, deltaT: 75 }));
    expect(byDeltaT).toBeInstanceOf(CaseError);
    expect((byDeltaT as CaseError).field).toBe('deltaT');
    expect((byDeltaT as CaseError).message).toMatch(/cannot hold ΔT = 75 K.*70\.33 K/);
    const byColdSide = err(() => operatingCurve(constantLeg(), { hotSide: TH, coldSide: 225 }));
    expect((byColdSide as CaseError).field).toBe('coldSide');
    expect(() => operatingCurve(constantLeg(), { hotSide: TH, deltaT: 70 })).not.toThrow();
    expect(() => operatingCurve(constantLeg(), { hotSide: TH })).toThrow(/^deltaT: give either/);
    expect(() => operatingCurve(constantLeg(), { hotSide: TH, coldSide: 310 })).toThrow(/^coldSide: /);
    expect(() => operatingCurve(constantLeg(), { hotSide: TH, deltaT: 10 }, { points: 1 })).toThrow(/^points: /);
    expect(() => operatingCurve(constantLeg(), { hotSide: TH, deltaT: 10 }, { currentLimit: -1 })).toThrow(/^currentLimit: /);
  });
});

describe('operating curve of a graded band-model leg against an independent integration', () => {
  // No closed form with temperature-dependent properties: each checked point
  // is recomputed with odex (Gragg–Bulirsch–Stoer extrapolation at 1e-13)
  // and a secant search on the cold-end heat flux, sharing no code with the
  // engine's integrator or root finders.
  const family = bandFamily({ carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
  const nodes = [0, 0.25, 0.5, 0.75, 1];
  const rc = 5e-10;
  const definition: LegDefinition = { length: L, area: A, leg: { kind: 'family', family, doping: { x: nodes, log10: nodes.map((f) => 19.6 - 1.3 * f * f) } }, ends: { contacts: { cold: rc, hot: rc } } };
  const bare = legFromDefinition({ ...definition, ends: undefined });
  const tc = 255;

  /** Qc, Qh, V by odex, with the contacts added by hand: ρc·J² of heat and ρc·J of voltage at each end. */
  function reference(current: number) {
    const J = current / A;
    const hotEnd = (q0: number) => odexHotEnd(bare, J, tc, q0 + J * J * rc);
    let a = 0;
    let b = 1e4;
    let ga = hotEnd(a).temperature - TH;
    let gb = hotEnd(b).temperature - TH;
    for (let k = 0; k < 30 && Math.abs(b - a) > 1e-12 * 1e6; k++) {
      const c = b - (gb * (b - a)) / (gb - ga);
      a = b;
      ga = gb;
      b = c;
      gb = hotEnd(b).temperature - TH;
    }
    const end = hotEnd(b);
    return { heatLoad: b * A, heatRejected: (end.flux + J * J * rc) * A, voltage: end.voltage + 2 * J * rc };
  }

  const curve = operatingCurve(definition, { hotSide: TH, coldSide: tc }, { points: 9 });
  const qScale = curve.maxHeatLoad.heatLoad;

  test('sampled Qc, Qh and V agree with odex to 1e-8', () => {
    for (const k of [1, 4, 7]) {
      const r = reference(curve.currents[k]);
      expect(Math.abs(curve.heatLoad[k] - r.heatLoad) / qScale).toBeLessThan(1e-8);
      expect(relative(curve.heatRejected[k], r.heatRejected)).toBeLessThan(1e-8);
      expect(relative(curve.voltage[k], r.voltage)).toBeLessThan(1e-8);
    }
  });

  test('the pumping range ends where odex gives Qc = 0', () => {
    for (const I of curve.pumpingRange) expect(Math.abs(reference(I).heatLoad) / qScale).toBeLessThan(1e-8);
  });

  test('dQc/dI = 0 at the current of maximum Qc and dCOP/dI = 0 at the current of maximum COP (central differences of odex)', () => {
    const h = 1e-3;
    const I = curve.maxHeatLoad.current;
    const slope = (reference(I * (1 + h)).heatLoad - reference(I * (1 - h)).heatLoad) / (2 * h * I);
    // Against the scale Qc,max / I*: zero to the optimiser's precision.
    expect(Math.abs(slope) / (qScale / I)).toBeLessThan(1e-4);
    const copAt = (current: number) => {
      const r = reference(current);
      return r.heatLoad / (r.voltage * current);
    };
    const Ic = curve.maxCop?.current ?? NaN;
    const copSlope = (copAt(Ic * (1 + h)) - copAt(Ic * (1 - h))) / (2 * h * Ic);
    expect(Math.abs(copSlope) / ((curve.maxCop?.cop ?? NaN) / Ic)).toBeLessThan(1e-4);
    expect(relative(curve.maxCop?.cop ?? NaN, copAt(Ic))).toBeLessThan(1e-8);
    // The trade-off the curves exist to show: best COP well below the current of maximum cooling.
    expect(Ic).toBeLessThan(0.6 * I);
  });
});
