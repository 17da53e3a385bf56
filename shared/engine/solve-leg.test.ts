import { bandFamily } from './band-model';
import { parseCase } from './check-case';
import { gradedLeg, uniformLeg } from './leg-profile';
import { optimizeLeg, solveLeg } from './run-case';
import { solveLegProblem } from './solve-leg';
import { tableFamily, type TableRow } from './table-family';
import { exactSegmentsColdSide, odexColdSide, odexHotEnd } from './test-support/reference-leg';

// The worked example of the issue: S = 200 µV/K, σ = 1e5 S/m, κ = 1.5 W/(m·K), Th = 300 K.
const S = 200e-6;
const SIGMA = 1e5;
const KAPPA = 1.5;
const L = 1e-3;
const A = 1e-6;
const R = L / (SIGMA * A); // 0.01 Ω
const K = (KAPPA * A) / L; // 1.5e-3 W/K
const Z = (S * S * SIGMA) / KAPPA;
const TH = 300;
const uniform = { hotSide: TH, length: L, area: A, segments: [{ fraction: 1, seebeck: S, sigma: SIGMA, kappa: KAPPA }] };
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

const band = bandFamily({ carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
// A strongly graded leg: two decades of doping, steepest at the hot end.
const nodes = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1];
const gradedBandLeg = gradedLeg(L, A, band, nodes, nodes.map((f) => 19.6 - 1.6 * f * f));

describe('uniform leg with constant properties against Ioffe’s closed forms', () => {
  // A. F. Ioffe, Semiconductor Thermoelements and Thermoelectric Cooling
  // (Infosearch, London 1957); the same formulas are in every thermoelectrics
  // handbook (e.g. CRC Handbook of Thermoelectrics, ed. D. M. Rowe, 1995, ch. 19).
  const tcMax = (Math.sqrt(1 + 2 * Z * TH) - 1) / Z;

  test('ΔTmax = 70.3307 K = Z·Tc²/2 with Tc = (√(1+2Z·Th) − 1)/Z, at I_opt = S·Tc/R', () => {
    expect(TH - tcMax).toBeCloseTo(70.3307, 4);
    expect(TH - tcMax).toBeCloseTo((Z * tcMax * tcMax) / 2, 10);
    const result = optimizeLeg(parseCase({ ...uniform, objective: 'maxDeltaT' }, 'optimize'));
    expect(result.deltaT).toBeCloseTo(70.3307, 4);
    expect(relative(result.coldSide, tcMax)).toBeLessThan(1e-9);
    expect(relative(result.current, (S * tcMax) / R)).toBeLessThan(1e-5);
  });

  test('at any current and load, Tc solves Qc = S·I·Tc − I²R/2 − K·ΔT and V = I·R + S·ΔT', () => {
    for (const [current, heatLoad] of [
      [1, 0],
      [3, 0.05],
      [7.5, 0.02],
    ]) {
      const s = solveLeg(parseCase({ ...uniform, current, heatLoad }, 'solve'));
      // Qc = S·I·Tc − ½I²R − K(Th − Tc)  ⇒  Tc = (Qc + ½I²R + K·Th)/(S·I + K)
      const tc = (heatLoad + 0.5 * current * current * R + K * TH) / (S * current + K);
      expect(relative(s.coldSide, tc)).toBeLessThan(1e-12);
      expect(relative(s.voltage, current * R + S * (TH - tc))).toBeLessThan(1e-12);
      expect(relative(s.power, s.voltage * current)).toBeLessThan(1e-12);
      expect(s.heatRejected - s.heatLoad).toBeCloseTo(s.power, 12);
    }
  });

  test('at ΔT = 20 K the current of maximum Qc (S·Tc/R) and of maximum COP (S·ΔT/(R(M−1))) differ, as the closed forms say', () => {
    const tc = 280;
    const dT = TH - tc;
    const M = Math.sqrt(1 + Z * 0.5 * (tc + TH));
    const iQ = (S * tc) / R;
    const iCop = (S * dT) / (R * (M - 1));
    const copMax = (tc * (M - TH / tc)) / (dT * (M + 1));
    expect(iQ).toBeCloseTo(5.6, 12);
    expect(iCop).toBeCloseTo(1.20603, 4);
    expect(copMax).toBeCloseTo(1.56254, 4);

    const q = optimizeLeg(parseCase({ ...uniform, objective: 'maxHeatLoad', coldSide: tc }, 'optimize'));
    expect(relative(q.current, iQ)).toBeLessThan(1e-5);
    expect(relative(q.heatLoad, (0.5 * S * S * tc * tc) / R - K * dT)).toBeLessThan(1e-9);

    // maxCop fixes Tc and Qc; with Qc = Qc(I_cop) the current must come out as I_cop.
    const qAtCop = S * tc * iCop - 0.5 * iCop * iCop * R - K * dT;
    const c = optimizeLeg(parseCase({ ...uniform, objective: 'maxCop', coldSide: tc, heatLoad: qAtCop }, 'optimize'));
    expect(relative(c.current, iCop)).toBeLessThan(1e-7);
    expect(relative(c.cop as number, copMax)).toBeLessThan(1e-7);
    expect(q.current / c.current).toBeGreaterThan(4);

    // And the COP at fixed Tc, Th is lower on either side of I_cop.
    const copAt = (current: number) => solveLeg(parseCase({ ...uniform, coldSide: tc, current }, 'solve')).cop as number;
    expect(copAt(iCop)).toBeCloseTo(copMax, 9);
    expect(copAt(0.95 * iCop)).toBeLessThan(copMax);
    expect(copAt(1.05 * iCop)).toBeLessThan(copMax);
  });
});

describe('graded and segmented legs against independent integrations', () => {
  test('a strongly graded band-model leg: Tc agrees with odex (Gragg–Bulirsch–Stoer) + bisection to 1e-9', () => {
    for (const current of [1.5, 4]) {
      const J = current / A;
      const s = solveLegProblem({ leg: gradedBandLeg, hotSide: TH, current, heatLoad: 0.002 });
      const reference = odexColdSide(gradedBandLeg, J, TH, 0.002 / A, 150, 300);
      expect(relative(s.coldSide, reference)).toBeLessThan(1e-9);
      // The reported accuracy is honest: at or above the error actually made, and within the target.
      expect(s.accuracy.relativeError).toBeLessThan(1e-9);
      expect(relative(s.coldSide, reference)).toBeLessThan(Math.max(10 * s.accuracy.relativeError, 1e-11));
      const end = odexHotEnd(gradedBandLeg, J, reference, 0.002 / A);
      expect(relative(s.heatRejected, end.flux * A)).toBeLessThan(1e-8);
      expect(relative(s.voltage, end.voltage)).toBeLessThan(1e-8);
      // Energy balance: P = Qh − Qc against the independently integrated V·I.
      expect(s.accuracy.energyBalance).toBeLessThan(1e-12);
    }
  });

  test('constant-property segments with jumps at the interfaces match the exact piecewise solution', () => {
    const segments = [
      { fraction: 0.5, seebeck: 150e-6, sigma: 1.5e5, kappa: 1.4 },
      { fraction: 0.3, seebeck: 210e-6, sigma: 0.9e5, kappa: 1.6 },
      { fraction: 0.2, seebeck: 260e-6, sigma: 0.5e5, kappa: 1.2 },
    ];
    const current = 3;
    const s = solveLeg(parseCase({ hotSide: TH, length: L, area: A, current, heatLoad: 0.01, segments }, 'solve'));
    const exact = exactSegmentsColdSide(
      segments.map((g) => ({ ...g, length: g.fraction * L })),
      current / A,
      TH,
      0.01 / A,
    );
    expect(relative(s.coldSide, exact.coldSide)).toBeLessThan(1e-12);
    expect(relative(s.heatRejected, exact.hotFlux * A)).toBeLessThan(1e-12);
    // The profile shows each jump: the interfaces appear twice, with both sides' properties.
    const interfaces = s.profile.x.filter((x, k) => k > 0 && x === s.profile.x[k - 1]);
    expect(interfaces).toEqual([0.5 * L, 0.8 * L]);
  });

  test('n-type legs mirror p-type ones: the current is the magnitude in the cooling direction', () => {
    const p = solveLegProblem({ leg: gradedBandLeg, hotSide: TH, current: 3, heatLoad: 0 });
    const nFamily = bandFamily({ carrier: 'n', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
    const n = solveLegProblem({ leg: gradedLeg(L, A, nFamily, nodes, nodes.map((f) => 19.6 - 1.6 * f * f)), hotSide: TH, current: 3, heatLoad: 0 });
    expect(n.coldSide).toBeCloseTo(p.coldSide, 9);
    expect(n.voltage).toBeCloseTo(p.voltage, 12);
    expect(n.voltage).toBeGreaterThan(0);
    expect(n.profile.seebeck[0]).toBeLessThan(0);
  });

  test('given the cold side instead, the heat load comes back (round trip of the two shooting modes)', () => {
    const a = solveLegProblem({ leg: gradedBandLeg, hotSide: TH, current: 2.5, heatLoad: 0.03 });
    const b = solveLegProblem({ leg: gradedBandLeg, hotSide: TH, current: 2.5, coldSide: a.coldSide });
    expect(b.accuracy.unknown).toBe('heatLoad');
    expect(relative(b.heatLoad, 0.03)).toBeLessThan(1e-8);
  });

  test('a table family built from band-model values reproduces the band-model leg (bicubic in log10 n and T)', () => {
    const rows: TableRow[] = [];
    const p = { seebeck: 0, sigma: 0, kappa: 0 };
    for (let y = 17.5; y <= 20.51; y += 0.25) {
      for (let t = 150; t <= 350; t += 20) {
        band.properties(y, t, p);
        rows.push({ perCm3: Math.pow(10, y), temperature: t, ...p });
      }
    }
    const table = tableFamily(rows);
    const tableLeg = gradedLeg(L, A, table, nodes, nodes.map((f) => 19.6 - 1.6 * f * f));
    const fromTable = solveLegProblem({ leg: tableLeg, hotSide: TH, current: 3, heatLoad: 0 });
    const fromBand = solveLegProblem({ leg: gradedBandLeg, hotSide: TH, current: 3, heatLoad: 0 });
    // Interpolation error of a 0.25-decade × 20 K grid, not solver error.
    expect(Math.abs(fromTable.coldSide - fromBand.coldSide)).toBeLessThan(0.02);
    expect(relative(fromTable.coldSide, odexColdSide(tableLeg, 3 / A, TH, 0, 150, 300))).toBeLessThan(1e-9);
  });
});

describe('edges of the steady state', () => {
  test('a heat load beyond the pumping capacity is a steady state too: the cold side settles above Th', () => {
    // Ioffe's balance again: Tc = (Qc + ½I²R + K·Th)/(S·I + K) = 665.2 K for Qc = 1 W, I = 4 A.
    const s = solveLeg(parseCase({ ...uniform, current: 4, heatLoad: 1 }, 'solve'));
    expect(s.coldSide).toBeCloseTo((1 + 0.5 * 16 * R + K * TH) / (S * 4 + K), 8);
    expect(s.deltaT).toBeLessThan(0);
  });

  test('a table leg whose cold end would fall below the table names material.rows and the temperature', () => {
    const rows: TableRow[] = [];
    for (const perCm3 of [1e18, 1e19, 1e20]) for (const temperature of [250, 300, 350]) rows.push({ perCm3, temperature, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 });
    const c = parseCase({ hotSide: 300, length: L, area: A, current: 4.6, material: { kind: 'table', rows }, doping: 1e19 }, 'solve');
    expect(() => solveLeg(c)).toThrow(/material\.rows: .*below the lowest temperature .*250 K/);
  });

  test('uniform band leg and graded leg share one code path: a one-section graded leg equals the uniform leg', () => {
    const a = solveLegProblem({ leg: uniformLeg(L, A, band, 19.1), hotSide: TH, current: 3, heatLoad: 0 });
    const b = solveLegProblem({ leg: gradedLeg(L, A, band, [0, 0.37, 1], [19.1, 19.1, 19.1]), hotSide: TH, current: 3, heatLoad: 0 });
    expect(relative(a.coldSide, b.coldSide)).toBeLessThan(1e-9);
  });
});
