import { bandFamily } from './band-model';
import { parseCase } from './check-case';
import { coupleCurve, moduleCurve, moduleDeltaTCurve, moduleTrade, type LegDefinition, type ModuleDefinition } from './module';
import { solveLeg } from './run-case';

const TH = 300;
const L = 1e-3;
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// Constant-property p and n legs (n: negative Seebeck coefficient).
const P = { seebeck: 210e-6, sigma: 1.1e5, kappa: 1.45 };
const N = { seebeck: -190e-6, sigma: 0.95e5, kappa: 1.6 };
const AP = 1e-6;
const AN = 1.3e-6;
const constant = (props: typeof P, area: number, contactResistivity = 0): LegDefinition => ({
  length: L,
  area,
  leg: { kind: 'segments', segments: [{ fraction: 1, ...props }] },
  ...(contactResistivity ? { ends: { contacts: { cold: contactResistivity, hot: contactResistivity } } } : {}),
});

/**
 * A couple of constant-property legs is one leg with S = Sp − Sn,
 * R = Rp + Rn (+ 2ρc/Ap + 2ρc/An), K = Kp + Kn, and Ioffe's closed forms
 * apply to it (A. F. Ioffe, Semiconductor Thermoelements and Thermoelectric
 * Cooling, 1957; CRC Handbook of Thermoelectrics, ed. D. M. Rowe, 1995, ch. 19).
 */
function coupleClosedForm(rc = 0) {
  const s = P.seebeck - N.seebeck;
  const r = L / (P.sigma * AP) + L / (N.sigma * AN) + (2 * rc) / AP + (2 * rc) / AN;
  const k = (P.kappa * AP) / L + (N.kappa * AN) / L;
  return { s, r, k, z: (s * s) / (r * k) };
}

describe('a couple of constant-property legs against the closed forms (Ioffe 1957)', () => {
  test('Qc = S·Tc·I − K·ΔT − I²R/2, P = S·ΔT·I + I²R at every sample; maximum Qc and COP; with contacts R → R + Rc', () => {
    for (const rc of [0, 8e-10]) {
      const tc = 265;
      const dT = TH - tc;
      const { s, r, k, z } = coupleClosedForm(rc);
      const curve = coupleCurve({ p: constant(P, AP, rc), n: constant(N, AN, rc) }, { hotSide: TH, coldSide: tc }, { points: 12 });
      const qMax = (s * s * tc * tc) / (2 * r) - k * dT;
      curve.currents.forEach((I, j) => {
        expect(Math.abs(curve.heatLoad[j] - (s * tc * I - k * dT - 0.5 * I * I * r)) / qMax).toBeLessThan(1e-12);
        expect(relative(curve.power[j], s * dT * I + I * I * r)).toBeLessThan(1e-12);
      });
      expect(relative(curve.maxHeatLoad.current, (s * tc) / r)).toBeLessThan(1e-5);
      expect(relative(curve.maxHeatLoad.heatLoad, qMax)).toBeLessThan(1e-11);
      const M = Math.sqrt(1 + z * 0.5 * (tc + TH));
      expect(relative(curve.maxCop?.current ?? NaN, (s * dT) / (r * (M - 1)))).toBeLessThan(1e-5);
      expect(relative(curve.maxCop?.cop ?? NaN, (tc * (M - TH / tc)) / (dT * (M + 1)))).toBeLessThan(1e-10);
    }
  });

  test('ΔTmax = Z·Tc²/2 at I = S·Tc/R; contacts lower both as R → R + Rc predicts', () => {
    const results = [0, 1e-9].map((rc) => {
      const { s, r, z } = coupleClosedForm(rc);
      const tc = (Math.sqrt(1 + 2 * z * TH) - 1) / z;
      const curve = moduleDeltaTCurve({ p: constant(P, AP, rc), n: constant(N, AN, rc) }, { hotSide: TH });
      expect(curve.mode).toBe('maxHeatLoadCurrent');
      expect(relative(curve.deltaTMax.coldSide, tc)).toBeLessThan(1e-9);
      expect(TH - curve.deltaTMax.coldSide).toBeCloseTo((z * tc * tc) / 2, 6);
      expect(relative(curve.deltaTMax.current, (s * tc) / r)).toBeLessThan(1e-5);
      // Along the curve Qc is the maximum at each ΔT: S²Tc²/(2R) − K·ΔT at I = S·Tc/R.
      const { k } = coupleClosedForm(rc);
      curve.deltaT.forEach((dT, j) => {
        const t = TH - dT;
        expect(Math.abs(curve.heatLoad[j] - ((s * s * t * t) / (2 * r) - k * dT))).toBeLessThan(1e-10);
        expect(relative(curve.currents[j], (s * t) / r)).toBeLessThan(1e-5);
      });
      expect(curve.deltaT[0]).toBe(0);
      expect(curve.heatLoad[curve.heatLoad.length - 1]).toBeCloseTo(0, 10);
      return curve.deltaTMax;
    });
    expect(TH - results[1].coldSide).toBeLessThan(TH - results[0].coldSide);
    expect(results[1].current).toBeLessThan(results[0].current);
  });

  test('at a fixed current Qc falls linearly with ΔT down to ΔT₀ = (S·Th·I − ½I²R)/(S·I + K)', () => {
    const { s, r, k } = coupleClosedForm();
    const I = 3;
    const curve = moduleDeltaTCurve({ p: constant(P, AP), n: constant(N, AN) }, { hotSide: TH }, { current: I, points: 9 });
    expect(curve.mode).toBe('fixedCurrent');
    const end = (s * TH * I - 0.5 * I * I * r) / (s * I + k);
    expect(relative(TH - curve.deltaTMax.coldSide, end)).toBeLessThan(1e-10);
    curve.deltaT.forEach((dT, j) => {
      expect(curve.currents[j]).toBe(I);
      expect(Math.abs(curve.heatLoad[j] - (s * (TH - dT) * I - k * dT - 0.5 * I * I * r))).toBeLessThan(1e-12);
    });
  });
});

// Temperature-dependent legs: a graded p leg and a uniform n leg of the band model.
const pFamily = bandFamily({ carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
const nFamily = bandFamily({ carrier: 'n', effectiveMass: 0.8, mobility300: 450, mobilityExponent: -1.5, latticeKappa300: 1.1, latticeKappaExponent: -1 });
const nodes = [0, 0.25, 0.5, 0.75, 1];
const bandP = (area: number, contactResistivity = 5e-10): LegDefinition => ({
  length: 1.2e-3,
  area,
  leg: { kind: 'family', family: pFamily, doping: { x: nodes, log10: nodes.map((f) => 19.6 - 1.5 * f * f) } },
  ends: { contacts: { cold: contactResistivity, hot: contactResistivity } },
});
const bandN = (area: number, contactResistivity = 5e-10): LegDefinition => ({
  length: 1.2e-3,
  area,
  leg: { kind: 'family', family: nFamily, doping: { x: [0, 1], log10: [19.08, 19.08] } },
  ends: { contacts: { cold: contactResistivity, hot: contactResistivity } },
});

describe('modules of N couples (temperature-dependent band-model legs, contacts)', () => {
  test('N identical couples: N times one couple’s Qc, Qh, V and P at the same current (a rule of the trade)', () => {
    const couple = { p: bandP(1e-6), n: bandN(1.2e-6) };
    const one = coupleCurve(couple, { hotSide: TH, deltaT: 35 }, { points: 7 });
    const seven = moduleCurve({ ...couple, couples: 7 }, { hotSide: TH, deltaT: 35 }, { points: 7 });
    seven.currents.forEach((I, j) => {
      expect(relative(I, one.currents[j])).toBeLessThan(1e-9);
      expect(Math.abs(seven.heatLoad[j] - 7 * one.heatLoad[j])).toBeLessThan(1e-9 * 7 * one.maxHeatLoad.heatLoad);
      expect(relative(seven.voltage[j], 7 * one.voltage[j])).toBeLessThan(1e-9);
      expect(relative(seven.heatRejected[j], 7 * one.heatRejected[j])).toBeLessThan(1e-9);
    });
    expect(relative(seven.maxHeatLoad.current, one.maxHeatLoad.current)).toBeLessThan(1e-6);
    expect(relative(seven.maxHeatLoad.heatLoad, 7 * one.maxHeatLoad.heatLoad)).toBeLessThan(1e-9);
    expect(relative(seven.maxCop?.cop ?? NaN, one.maxCop?.cop ?? NaN)).toBeLessThan(1e-9);
  });

  test('a fixed total leg area split into 4× more couples: current ÷ 4, voltage × 4 at the same Qc and COP, plates included', () => {
    const base: ModuleDefinition = { p: bandP(1e-6), n: bandN(1.2e-6), couples: 12, coldPlateResistance: 0.3, hotPlateResistance: 0.2 };
    const split: ModuleDefinition = { ...base, p: bandP(0.25e-6), n: bandN(0.3e-6), couples: 48 };
    const a = moduleCurve(base, { hotSide: TH, deltaT: 30 }, { points: 5 });
    const b = moduleCurve(split, { hotSide: TH, deltaT: 30 }, { points: 5 });
    expect(relative(b.pumpingRange[0], a.pumpingRange[0] / 4)).toBeLessThan(1e-8);
    expect(relative(b.pumpingRange[1], a.pumpingRange[1] / 4)).toBeLessThan(1e-8);
    for (const [x, y] of [
      [a.maxHeatLoad, b.maxHeatLoad],
      [a.maxCop, b.maxCop],
    ]) {
      expect(relative(y?.current ?? NaN, (x?.current ?? NaN) / 4)).toBeLessThan(1e-5);
      expect(relative(y?.voltage ?? NaN, 4 * (x?.voltage ?? NaN))).toBeLessThan(1e-5);
      expect(relative(y?.heatLoad ?? NaN, x?.heatLoad ?? NaN)).toBeLessThan(1e-8);
      expect(relative(y?.cop ?? NaN, x?.cop ?? NaN)).toBeLessThan(1e-8);
    }
  });

  test('moduleTrade solves every split in full and finds I·N and V/N fixed, Qc and COP the same; the limit flags the low-N rows', () => {
    const module: ModuleDefinition = { p: bandP(1e-6), n: bandN(1.2e-6), couples: 20, coldPlateResistance: 0.1, hotPlateResistance: 0.05 };
    const trade = moduleTrade(module, { hotSide: TH, deltaT: 30 }, { couples: [1, 5, 20, 80], currentLimit: 10 });
    expect(relative(trade.totalLegArea, 20 * 2.2e-6)).toBeLessThan(1e-12);
    const ref = trade.rows[2];
    expect(ref.couples).toBe(20);
    for (const row of trade.rows) {
      expect(relative(row.legArea.p * row.couples, 20e-6)).toBeLessThan(1e-12);
      expect(relative(row.maxHeatLoad.current * row.couples, ref.maxHeatLoad.current * 20)).toBeLessThan(1e-6);
      expect(relative(row.maxHeatLoad.voltage / row.couples, ref.maxHeatLoad.voltage / 20)).toBeLessThan(1e-6);
      expect(relative(row.maxHeatLoad.heatLoad, ref.maxHeatLoad.heatLoad)).toBeLessThan(1e-8);
      expect(relative(row.maxCop?.cop ?? NaN, ref.maxCop?.cop ?? NaN)).toBeLessThan(1e-8);
      expect(row.maxHeatLoad.overLimit).toBe(row.maxHeatLoad.current > 10);
    }
    expect(trade.rows[0].maxHeatLoad.overLimit).toBe(true);
    expect(trade.rows[3].maxHeatLoad.overLimit).toBe(false);
  });
});

describe('plates: junction temperatures solved self-consistently', () => {
  test('constant-property module: the 2 × 2 linear system of the closed forms, solved directly', () => {
    // With constant properties Qc and Qh are affine in the junction
    // temperatures, so Tc_j = T_load − Θc·Qc and Th_j = T_sink + Θh·Qh are
    // two linear equations (Ioffe's forms times N).
    const couples = 25;
    const thetaC = 0.4;
    const thetaH = 0.25;
    const { s, r, k } = coupleClosedForm();
    const module: ModuleDefinition = { p: constant(P, AP), n: constant(N, AN), couples, coldPlateResistance: thetaC, hotPlateResistance: thetaH };
    const load = 275;
    const curve = moduleCurve(module, { hotSide: TH, coldSide: load }, { points: 8 });
    expect(curve.coldJunction).toHaveLength(8);
    curve.currents.forEach((I, j) => {
      const [S_, R_, K_] = [couples * s, couples * r, couples * k];
      // (1 + Θc(S·I + K))·Tc − Θc·K·Th = T_load + Θc·I²R/2
      // −Θh·K·Tc + (1 − Θh(S·I − K))·Th = T_sink + Θh·I²R/2
      const a11 = 1 + thetaC * (S_ * I + K_);
      const a12 = -thetaC * K_;
      const a21 = -thetaH * K_;
      const a22 = 1 - thetaH * (S_ * I - K_);
      const b1 = load + 0.5 * thetaC * I * I * R_;
      const b2 = TH + 0.5 * thetaH * I * I * R_;
      const det = a11 * a22 - a12 * a21;
      const tc = (b1 * a22 - a12 * b2) / det;
      const th = (a11 * b2 - a21 * b1) / det;
      const qc = S_ * I * tc - K_ * (th - tc) - 0.5 * I * I * R_;
      expect(Math.abs((curve.coldJunction as number[])[j] - tc)).toBeLessThan(1e-8);
      expect(Math.abs((curve.hotJunction as number[])[j] - th)).toBeLessThan(1e-8);
      expect(Math.abs(curve.heatLoad[j] - qc)).toBeLessThan(1e-8 * Math.abs(curve.maxHeatLoad.heatLoad));
    });
    // Plates cost heat load against the same module without them.
    const bare = moduleCurve({ ...module, coldPlateResistance: 0, hotPlateResistance: 0 }, { hotSide: TH, coldSide: load });
    expect(curve.maxHeatLoad.heatLoad).toBeLessThan(bare.maxHeatLoad.heatLoad);
    expect(bare.coldJunction).toBeUndefined();
  });

  test('constant-property module with a hot plate: ΔTmax against the closed forms maximised over the current', () => {
    // With Qc = 0 no heat crosses the cold plate (Tc_j = T_load) and the hot
    // junction sits at T_sink + Θh·P. At a current I, Qc = 0 and that balance
    // are two linear equations in (Tc, Th_j); ΔTmax is their best over I,
    // found here by a golden-section search of the closed form.
    const couples = 10;
    const thetaH = 0.5;
    const { s, r, k } = coupleClosedForm();
    const [S_, R_, K_] = [couples * s, couples * r, couples * k];
    const loadAt = (I: number) => {
      // (S·I + K)·Tc − K·Th = I²R/2;  Θh·S·I·Tc + (1 − Θh·S·I)·Th = T_sink + Θh·I²R
      const a11 = S_ * I + K_;
      const a12 = -K_;
      const a21 = thetaH * S_ * I;
      const a22 = 1 - thetaH * S_ * I;
      const b1 = 0.5 * I * I * R_;
      const b2 = TH + thetaH * I * I * R_;
      return (b1 * a22 - a12 * b2) / (a11 * a22 - a12 * a21);
    };
    let [lo, hi] = [0.5, 10];
    const g = (3 - Math.sqrt(5)) / 2;
    for (let i = 0; i < 200; i++) {
      const x1 = lo + g * (hi - lo);
      const x2 = hi - g * (hi - lo);
      if (loadAt(x1) < loadAt(x2)) hi = x2;
      else lo = x1;
    }
    const best = 0.5 * (lo + hi);
    const curve = moduleDeltaTCurve({ p: constant(P, AP), n: constant(N, AN), couples, hotPlateResistance: thetaH }, { hotSide: TH }, { points: 5 });
    expect(Math.abs(curve.deltaTMax.coldSide - loadAt(best))).toBeLessThan(1e-6);
    expect(relative(curve.deltaTMax.current, best)).toBeLessThan(1e-4);
    expect(curve.deltaTMax.coldJunction).toBeCloseTo(curve.deltaTMax.coldSide, 9);
    expect(Math.abs(curve.deltaTMax.hotJunction - (TH + thetaH * curve.deltaTMax.power))).toBeLessThan(1e-6);
  });

  test('band-model module: each leg solved on its own at the reported junction temperatures gives the module’s Qc and V', () => {
    const couples = 31;
    const module: ModuleDefinition = { p: bandP(1e-6), n: bandN(1.2e-6), couples, coldPlateResistance: 0.08, hotPlateResistance: 0.05 };
    const curve = moduleCurve(module, { hotSide: TH, deltaT: 40 }, { points: 5 });
    const pCase = { hotSide: 0, length: 1.2e-3, area: 1e-6, material: { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 }, doping: { x: nodes, perCm3: nodes.map((f) => Math.pow(10, 19.6 - 1.5 * f * f)) }, contactResistivity: 5e-10 };
    const nCase = { ...pCase, area: 1.2e-6, material: { kind: 'band', carrier: 'n', effectiveMass: 0.8, mobility300: 450, mobilityExponent: -1.5, latticeKappa300: 1.1, latticeKappaExponent: -1 }, doping: Math.pow(10, 19.08) };
    for (const point of [curve.maxHeatLoad, curve.maxCop]) {
      if (!point) throw new Error('no maximum COP');
      // The junction equations are solved to 0.1 × tolerance × Th = 3e-8 K.
      expect(Math.abs(point.coldJunction - (point.coldSide - 0.08 * point.heatLoad))).toBeLessThan(3e-8);
      expect(Math.abs(point.hotJunction - (point.hotSide + 0.05 * point.heatRejected))).toBeLessThan(3e-8);
      const solve = (c: typeof pCase | typeof nCase) => solveLeg(parseCase({ ...c, hotSide: point.hotJunction, coldSide: point.coldJunction, current: point.current }, 'solve'));
      const p = solve(pCase);
      const n = solve(nCase);
      expect(relative(point.heatLoad, couples * (p.heatLoad + n.heatLoad))).toBeLessThan(1e-8);
      expect(relative(point.voltage, couples * (p.voltage + n.voltage))).toBeLessThan(1e-8);
      expect(relative(point.heatRejected, couples * (p.heatRejected + n.heatRejected))).toBeLessThan(1e-8);
    }
    // The plates' temperature drops are what they should be for a few watts.
    expect(curve.maxHeatLoad.coldJunction).toBeLessThan(260);
    expect(curve.maxHeatLoad.hotJunction).toBeGreaterThan(300);
  });

  test('the legs must be of opposite carriers, and the plates and N valid', () => {
    const p = constant(P, AP);
    const n = constant(N, AN);
    expect(() => coupleCurve({ p: n, n }, { hotSide: TH, deltaT: 10 })).toThrow(/^p\.segments: the p leg must be p-type/);
    expect(() => coupleCurve({ p, n: p }, { hotSide: TH, deltaT: 10 })).toThrow(/^n\.segments: the n leg must be n-type/);
    expect(() => moduleCurve({ p, n, couples: 2.5 }, { hotSide: TH, deltaT: 10 })).toThrow(/^couples: /);
    expect(() => moduleCurve({ p, n, coldPlateResistance: -1 }, { hotSide: TH, deltaT: 10 })).toThrow(/^coldPlateResistance: /);
    expect(() => moduleDeltaTCurve({ p, n }, { hotSide: TH }, { current: 1e3 })).toThrow(/^deltaTCurrent: /);
  });
});
