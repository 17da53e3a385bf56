import { bandFamily } from './band-model';
import { parseCase } from './check-case';
import { ztOptimalLog10 } from './family-helpers';
import { gradedLeg, uniformLeg } from './leg-profile';
import type { Properties } from './material-family';
import { optimizeCurrent } from './optimize-current';
import { isotonic } from './optimize-doping';
import { optimizeLeg, type BaselineReport, type OptimizeProgress } from './run-case';
import { toleranceBand } from './sensitivity';
import { solveLegProblem } from './solve-leg';

// The benchmark family of the issue: p-type, m* = 1, μ300 = 350 cm²/(V·s),
// μ ∝ T^−1.5, κL = 1 W/(m·K) ∝ T^−1, bounds 1e18–1e20 cm⁻³, Th = 300 K.
const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const base = { hotSide: 300, length: 1e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 } };
const family = bandFamily(material);
const conditions = { objective: 'maxDeltaT' as const, hotSide: 300, heatLoad: 0 };

const progress: OptimizeProgress[] = [];
const result = optimizeLeg(parseCase({ ...base, controlPoints: 6 }, 'optimize'), { onProgress: (p) => progress.push(p) });
const baselines = result.baselines as BaselineReport;
const nodeLog10 = (result.doping?.perCm3 ?? []).map(Math.log10);
const x = result.doping?.x ?? [];

describe('band-model family near room temperature: graded optimum against the baselines', () => {
  test('the optimised profile cools more than the best uniform leg and the local-best-zT leg', () => {
    // Graded beats uniform: "Beating the maximum cooling limit with graded
    // thermoelectric materials", Appl. Phys. Lett. 89, 212101 (2006).
    expect(result.deltaT).toBeGreaterThan(baselines.uniform.deltaT + 1);
    expect(result.deltaT).toBeGreaterThan(baselines.localBestZt.deltaT + 1);
  });

  test('the local-best-zT leg is no better than the best uniform leg', () => {
    // A fact of the trade: local zT is the wrong target for cooling (the
    // leg's ΔT depends on where Joule and Peltier heat are released, not on
    // the local figure of merit alone).
    expect(baselines.localBestZt.deltaT).toBeLessThanOrEqual(baselines.uniform.deltaT + 1e-6);
  });

  test('the uniform baseline is the optimum over doping and current (checked by re-optimising the current nearby)', () => {
    const y = Math.log10(baselines.uniform.perCm3);
    for (const d of [-0.05, 0.05]) {
      const r = optimizeCurrent(uniformLeg(1e-3, 1e-6, family, y + d), conditions, 1e-9);
      expect(r.score.deltaT).toBeLessThan(baselines.uniform.deltaT);
    }
  });

  test('the local-best-zT leg is self-consistent: each node is zT-optimal at its own solved temperature', () => {
    const z = baselines.localBestZt;
    const leg = gradedLeg(1e-3, 1e-6, family, z.doping.x, z.doping.perCm3.map(Math.log10));
    const s = solveLegProblem({ leg, hotSide: 300, current: z.current, heatLoad: 0 });
    const p: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
    const zt = (y: number, t: number) => {
      family.properties(y, t, p);
      return (p.seebeck * p.seebeck * p.sigma * t) / p.kappa;
    };
    z.doping.x.forEach((f, k) => {
      const i = s.profile.x.findIndex((px) => Math.abs(px - f * 1e-3) < 1e-15);
      const t = s.profile.temperature[i];
      const y = Math.log10(z.doping.perCm3[k]);
      // Independent check by neighbouring dopings rather than the same optimiser.
      expect(zt(y, t)).toBeGreaterThanOrEqual(zt(y + 0.01, t) - 1e-12);
      expect(zt(y, t)).toBeGreaterThanOrEqual(zt(y - 0.01, t) - 1e-12);
      expect(Math.abs(y - ztOptimalLog10(family, t, 18, 20))).toBeLessThan(1e-5);
    });
    expect(z.converged).toBe(true);
  });

  test('the optimum is a local maximum: moving any node or the current does not gain', () => {
    const at = (log10: number[], current: number) => solveLegProblem({ leg: gradedLeg(1e-3, 1e-6, family, x, log10), hotSide: 300, current, heatLoad: 0 }).deltaT;
    expect(at(nodeLog10, result.current)).toBeCloseTo(result.deltaT, 7);
    nodeLog10.forEach((y, k) => {
      for (const d of [-0.03, 0.03]) {
        if (y + d < 18 || y + d > 20) continue;
        expect(at(nodeLog10.map((v, i) => (i === k ? v + d : v)), result.current)).toBeLessThan(result.deltaT + 1e-5);
      }
    });
    expect(at(nodeLog10, result.current * 1.02)).toBeLessThan(result.deltaT);
    expect(at(nodeLog10, result.current * 0.98)).toBeLessThan(result.deltaT);
  });

  test('sensitivity: interior nodes have ~zero slope and negative curvature; tolerances follow the quadratic model', () => {
    expect(result.sensitivity).toHaveLength(6);
    for (const s of result.sensitivity) {
      const atBound = Math.abs(Math.log10(s.perCm3) - 18) < 1e-6 || Math.abs(Math.log10(s.perCm3) - 20) < 1e-6;
      if (!atBound) {
        expect(Math.abs(s.firstDerivative)).toBeLessThan(0.05);
        expect(s.secondDerivative).toBeLessThan(0);
      }
      if (s.plusDecades !== null) expect(s.firstDerivative * s.plusDecades + 0.5 * s.secondDerivative * s.plusDecades ** 2).toBeCloseTo(-1, 9);
      if (s.minusDecades !== null) expect(s.firstDerivative * s.minusDecades + 0.5 * s.secondDerivative * s.minusDecades ** 2).toBeCloseTo(-1, 9);
    }
    // The quadratic model against direct solves for an interior node: close for small
    // deviations; at the 1 K point (~0.3 decade) the cubic terms are visible, so
    // only the order of magnitude is asserted there.
    const k = 2;
    const s = result.sensitivity[k];
    const lossAt = (d: number) =>
      result.deltaT - solveLegProblem({ leg: gradedLeg(1e-3, 1e-6, family, x, nodeLog10.map((v, i) => (i === k ? v + d : v))), hotSide: 300, current: result.current, heatLoad: 0 }).deltaT;
    const model = (d: number) => -(s.firstDerivative * d + 0.5 * s.secondDerivative * d * d);
    expect(Math.abs(lossAt(0.05) - model(0.05)) / model(0.05)).toBeLessThan(0.05);
    expect(lossAt(s.plusDecades as number)).toBeGreaterThan(0.6);
    expect(lossAt(s.plusDecades as number)).toBeLessThan(1.4);
  });

  test('progress is reported with a non-decreasing best and a resumable state', () => {
    expect(progress.map((p) => p.phase).slice(0, 2)).toEqual(['uniform', 'localBestZt']);
    const main = progress.filter((p) => p.phase === 'profile');
    expect(main.length).toBeGreaterThan(3);
    main.forEach((p, i) => {
      expect(p.iteration).toBe(i + 1);
      if (i > 0) expect(p.best).toBeGreaterThanOrEqual(main[i - 1].best);
      expect(p.state?.kind).toBe('doping');
    });
    expect(main[main.length - 1].best).toBeCloseTo(result.objective.value, 9);
  });
});

describe('stopping and resuming', () => {
  test('a stop signal ends the run with the best design so far; resuming from its state reaches the same optimum', () => {
    let calls = 0;
    let state: OptimizeProgress['state'] = null;
    const stopped = optimizeLeg(parseCase({ ...base, controlPoints: 6 }, 'optimize'), {
      onProgress: (p) => {
        state = p.state;
      },
      shouldStop: () => ++calls > 3,
    });
    expect(stopped.stopped).toBe(true);
    expect(stopped.deltaT).toBeGreaterThanOrEqual(baselinesOf(stopped).uniform.deltaT - 1e-9);
    expect(stopped.deltaT).toBeLessThan(result.deltaT);
    expect(state).not.toBeNull();
    const resumed = optimizeLeg(parseCase({ ...base, controlPoints: 6 }, 'optimize'), { start: stopped.state ?? undefined });
    expect(resumed.stopped).toBe(false);
    expect(resumed.deltaT).toBeCloseTo(result.deltaT, 3);
  });
});

const baselinesOf = (r: { baselines: unknown }) => r.baselines as BaselineReport;

describe('monotone profiles', () => {
  test('stay monotone and inside the bounds, and cannot beat the free optimum', () => {
    const mono = optimizeLeg(parseCase({ ...base, controlPoints: 6, monotone: true }, 'optimize'));
    const y = (mono.doping?.perCm3 ?? []).map(Math.log10);
    const increasing = y.every((v, i) => i === 0 || v >= y[i - 1] - 1e-12);
    const decreasing = y.every((v, i) => i === 0 || v <= y[i - 1] + 1e-12);
    expect(increasing || decreasing).toBe(true);
    y.forEach((v) => {
      expect(v).toBeGreaterThanOrEqual(18 - 1e-12);
      expect(v).toBeLessThanOrEqual(20 + 1e-12);
    });
    expect(mono.deltaT).toBeLessThanOrEqual(result.deltaT + 1e-3);
    expect(mono.deltaT).toBeGreaterThan(baselinesOf(mono).uniform.deltaT);
  });

  test('isotonic regression (pool adjacent violators) gives the closest non-decreasing sequence', () => {
    // Least-squares isotonic fit of [1, 3, 2, 4]: the violating pair pools to its mean 2.5.
    expect(isotonic([1, 3, 2, 4])).toEqual([1, 2.5, 2.5, 4]);
    expect(isotonic([3, 2, 1])).toEqual([2, 2, 2]);
  });
});

describe('tolerance band from the quadratic model', () => {
  test('symmetric at a stationary point, one-sided on a pure slope', () => {
    // ½·f''·δ² = −1 with f'' = −2 K/decade² → δ = ±1 decade.
    expect(toleranceBand(0, -2)).toEqual({ minus: -1, plus: 1 });
    // f'·δ = −1 with f' = 0.5 K/decade → only decreasing the doping costs 1 K, at −2 decades.
    expect(toleranceBand(0.5, 0)).toEqual({ minus: -2, plus: null });
  });
});

describe('other objectives on the band family', () => {
  test('maxHeatLoad at a given cold side: the graded leg pumps more than both baselines, at exactly that cold side', () => {
    const r = optimizeLeg(parseCase({ ...base, controlPoints: 5, objective: 'maxHeatLoad', coldSide: 250 }, 'optimize'));
    const b = r.baselines as BaselineReport;
    expect(r.coldSide).toBeCloseTo(250, 9);
    expect(r.heatLoad).toBeGreaterThan(b.uniform.objective);
    expect(r.heatLoad).toBeGreaterThan(b.localBestZt.objective);
    expect(r.objective.value).toBeCloseTo(r.heatLoad, 9);
    // Energy balance of the reported design.
    expect(r.power).toBeCloseTo(r.voltage * r.current, 9);
  });

  test('maxCop at a given cold side and heat load: the current is the one that meets both, the COP beats the baselines', () => {
    const r = optimizeLeg(parseCase({ ...base, controlPoints: 5, objective: 'maxCop', coldSide: 270, heatLoad: 0.05 }, 'optimize'));
    const b = r.baselines as BaselineReport;
    expect(r.coldSide).toBeCloseTo(270, 6);
    expect(r.heatLoad).toBe(0.05);
    expect(r.cop as number).toBeCloseTo(0.05 / r.power, 12);
    expect(r.cop as number).toBeGreaterThan(b.uniform.objective);
    expect(r.cop as number).toBeGreaterThan(b.localBestZt.objective);
  });
});

describe('table families at the edge of their range', () => {
  test('an optimum pinned at the table’s lowest temperature is reported with a warning, not as the leg’s limit', () => {
    const rows = [];
    const p: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
    for (const perCm3 of [3e18, 1e19, 3e19]) {
      for (const temperature of [200, 250, 300]) {
        family.properties(Math.log10(perCm3), temperature, p);
        rows.push({ perCm3, temperature, ...p });
      }
    }
    // Th = 260 K: the free optimum would be near 190 K, below the table.
    const r = optimizeLeg(parseCase({ hotSide: 260, length: 1e-3, area: 1e-6, material: { kind: 'table', rows }, controlPoints: 3 }, 'optimize'));
    expect(r.coldSide).toBeCloseTo(200, 4);
    expect(r.warnings.join(' ')).toMatch(/lowest temperature \(200 K\)/);
  });
});
