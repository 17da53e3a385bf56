/**
 * Every path that builds a leg from a design's case — the optimiser, both
 * baselines, zoning, tolerance bands, as-grown predictions, operating curves
 * and modules — uses the case's contacts and parasitic heat. Each path is
 * run with and without contacts (5e-10 Ω·m² at each end, 5 µΩ·cm², the
 * demo module's value) and must (a) lose ΔT or heat load, and (b) agree with
 * the same leg solved directly by `solveLeg` with the contacts on (or with
 * the closed forms, for constant legs), so a path that dropped the contacts
 * would fail (b) by the ~2 K they cost.
 */
import { legsFromRun, optimizeLeg, parseCase, parseLegDefinition, parseModuleCase, solveLeg, operatingCurve, moduleCurve, type CaseInput } from '../engine';
import { predictAsGrown } from './as-grown';
import { zoneTolerances } from './zone-tolerance';
import { problemOf, scoreLayout, zoneProfile } from './zoning';

const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const base: CaseInput = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 5 };
const RC = 5e-10;
const withRc: CaseInput = { ...base, contactResistivity: { cold: RC, hot: RC } };

const ideal = optimizeLeg(parseCase(base));
const contacted = optimizeLeg(parseCase(withRc));
const solveAt = (c: CaseInput, doping: number | { x: number[]; perCm3: number[] }, current: number) => {
  const { bounds: _b, controlPoints: _c, ...leg } = c;
  return solveLeg(parseCase({ ...leg, doping, current, heatLoad: 0 }, 'solve'));
};
const uniformOf = (r: typeof ideal) => (r.baselines && 'perCm3' in r.baselines.uniform ? r.baselines.uniform : null)!;

describe('optimiser and baselines', () => {
  test('the optimum loses ΔT to the contacts and is what solveLeg gives with them', () => {
    expect(ideal.deltaT - contacted.deltaT).toBeGreaterThan(1);
    const check = solveAt(withRc, contacted.doping!, contacted.current);
    expect(Math.abs(check.deltaT - contacted.deltaT)).toBeLessThan(1e-6);
  });

  test('the best uniform leg: with contacts, solveLeg at its doping and current agrees', () => {
    const u = uniformOf(contacted);
    expect(uniformOf(ideal).deltaT - u.deltaT).toBeGreaterThan(1);
    expect(Math.abs(solveAt(withRc, u.perCm3, u.current).deltaT - u.deltaT)).toBeLessThan(1e-6);
  });

  test('the local-best-zT leg: the same', () => {
    const local = contacted.baselines!.localBestZt!;
    expect(ideal.baselines!.localBestZt!.deltaT - local.deltaT).toBeGreaterThan(1);
    expect(Math.abs(solveAt(withRc, local.doping, local.current).deltaT - local.deltaT)).toBeLessThan(1e-6);
  });
});

describe('zoning, tolerance bands and as-grown predictions', () => {
  const p0 = problemOf(parseCase(base), 1e-9);
  const p1 = problemOf(parseCase(withRc), 1e-9);

  test('problemOf carries the case’s contacts and parasitic heat', () => {
    expect(p0.ends).toBeUndefined();
    expect(p1.ends).toEqual({ contacts: { cold: RC, hot: RC } });
    expect(problemOf(parseCase({ ...base, parasitic: { heatLoad: 0.002 } }), 1e-9).ends).toEqual({ parasitic: { heatLoad: 0.002 } });
  });

  test('zoning: one zone is the contacted best uniform leg, and each K loses to the contacts', () => {
    const steps0 = zoneProfile(parseCase(base), { maxZones: 2, minZoneFraction: 0.1, tolerance: 1e-9 });
    const steps1 = zoneProfile(parseCase(withRc), { maxZones: 2, minZoneFraction: 0.1, tolerance: 1e-9 });
    expect(Math.abs(steps1[0]!.score.deltaT - uniformOf(contacted).deltaT)).toBeLessThan(1e-4);
    steps1.forEach((s, k) => expect(steps0[k]!.score.deltaT - s.score.deltaT).toBeGreaterThan(1));
  });

  test('scoreLayout (zones, tolerance bands) scores a zone with the contacts: equal to solveLeg', () => {
    const u = uniformOf(contacted);
    const layout = { fractions: [1], log10: [Math.log10(u.perCm3)] };
    const s1 = scoreLayout(p1, layout, u.current);
    expect(Math.abs(s1.deltaT - solveAt(withRc, u.perCm3, u.current).deltaT)).toBeLessThan(1e-6);
    expect(scoreLayout(p0, layout, u.current).deltaT - s1.deltaT).toBeGreaterThan(1);
  });

  test('tolerance bands: each edge, re-solved by solveLeg with the contacts, loses what the band says', () => {
    const u = uniformOf(contacted);
    const layout = { fractions: [1], log10: [Math.log10(u.perCm3)] };
    const score = scoreLayout(p1, layout, u.current);
    const [band] = zoneTolerances(p1, layout, score, 1);
    for (const [edge, loss, atBound] of [
      [band!.lowPerCm3, band!.lossAtLow, band!.lowAtBound],
      [band!.highPerCm3, band!.lossAtHigh, band!.highAtBound],
    ] as const) {
      const direct = score.deltaT - solveAt(withRc, edge, u.current).deltaT;
      expect(Math.abs(direct - loss)).toBeLessThan(1e-5);
      if (!atBound) expect(loss).toBeGreaterThan(0.9);
    }
  });

  test('as-grown: the predicted ΔT is the contacted leg’s, lower than without contacts', () => {
    const points = [
      { positionFraction: 0.1, log10: 19.5 },
      { positionFraction: 0.5, log10: 19.0 },
      { positionFraction: 0.9, log10: 18.4 },
    ];
    const a0 = predictAsGrown(p0, points, contacted.current);
    const a1 = predictAsGrown(p1, points, contacted.current);
    const doping = { x: [0, 0.1, 0.5, 0.9, 1], perCm3: [19.5, 19.5, 19.0, 18.4, 18.4].map((y) => 10 ** y) };
    expect(Math.abs(a1.atDesignCurrent.deltaT - solveAt(withRc, doping, contacted.current).deltaT)).toBeLessThan(1e-6);
    expect(a0.atDesignCurrent.deltaT - a1.atDesignCurrent.deltaT).toBeGreaterThan(1);
    expect(a0.atBestCurrent.deltaT - a1.atBestCurrent.deltaT).toBeGreaterThan(1);
  });
});

describe('curves and modules from a stored run carry its contacts and parasitic load', () => {
  // Constant legs, so Ioffe's forms extended for contacts and a parasitic
  // load give the answer (derivation in shared/engine/leg-ends.test.ts):
  // Qc = S·I·Tc − K·ΔT − a·I² − Qp with a = R/2 + ρc,cold/A, largest at I = S·Tc/(2a).
  const S = 200e-6;
  const sigma = 1e5;
  const kappa = 1.5;
  const L = 1e-3;
  const A = 1e-6;
  const R = L / (sigma * A);
  const K = (kappa * A) / L;
  const qp = 0.002;
  const runCase = (seebeck: number) => ({
    hotSide: 300, length: L, area: A, material: { kind: 'constant', seebeck, sigma, kappa },
    contactResistivity: { cold: 1e-9, hot: 3e-10 }, parasitic: { heatLoad: qp },
  });
  const a = R / 2 + 1e-9 / A;
  const tc = 270;

  test('the run’s leg on the operating-curves page: maximum Qc from the closed form', () => {
    const legs = legsFromRun(runCase(S), { baselines: null });
    expect(legs.optimum).toMatchObject({ contactResistivity: { cold: 1e-9, hot: 3e-10 }, parasitic: { heatLoad: qp } });
    const curve = operatingCurve(parseLegDefinition(legs.optimum, 300), { hotSide: 300, coldSide: tc });
    expect(Math.abs(curve.maxHeatLoad.current - (S * tc) / (2 * a)) / ((S * tc) / (2 * a))).toBeLessThan(1e-6);
    expect(Math.abs(curve.maxHeatLoad.heatLoad - ((S * S * tc * tc) / (4 * a) - K * 30 - qp))).toBeLessThan(1e-9);
  });

  test('a module of the run’s p leg and an n run’s leg: the couple’s closed form, N times', () => {
    const p = legsFromRun(runCase(S), { baselines: null }).optimum;
    const n = legsFromRun(runCase(-S), { baselines: null }).optimum;
    const m = parseModuleCase({ hotSide: 300, coldSide: tc, p, n, couples: 10 });
    const curve = moduleCurve(m.module, m.conditions);
    const current = (2 * S * tc) / (2 * 2 * a);
    const best = 10 * ((2 * S * tc * current) - 2 * K * 30 - 2 * a * current * current - 2 * qp);
    expect(Math.abs(curve.maxHeatLoad.current - current) / current).toBeLessThan(1e-6);
    expect(Math.abs(curve.maxHeatLoad.heatLoad - best)).toBeLessThan(1e-8);
    // The module's own contact value, when given, replaces both legs' (the module form's field).
    const ideal = parseModuleCase({ hotSide: 300, coldSide: tc, p: { ...p, contactResistivity: 0 }, n: { ...n, contactResistivity: 0 }, couples: 10 });
    expect(moduleCurve(ideal.module, ideal.conditions).maxHeatLoad.heatLoad).toBeGreaterThan(curve.maxHeatLoad.heatLoad);
  });
});
