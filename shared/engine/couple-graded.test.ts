import { parseCase } from './check-case';
import { parseCoupleCase } from './couple-case';
import { parseLegDefinition } from './device-case';
import { deviceSolver } from './device';
import { legFromDefinition, moduleDeltaTCurve, type LegDefinition } from './module';
import { optimizeLeg } from './run-case';
import { runCouple } from './run-couple-case';

/**
 * A couple of graded band-model legs: no closed form, so the optimum is
 * compared with designs found without the couple optimiser — each leg
 * optimised alone and assembled, and a brute-force grid over the ratio and
 * the current for the optimum's profiles.
 */
const TH = 300;
const L = 1.2e-3;
const AREA = 1e-6;
const band = (carrier: 'p' | 'n', effectiveMass: number, mobility300: number, latticeKappa300: number) => ({ kind: 'band', carrier, effectiveMass, mobility300, mobilityExponent: -1.5, latticeKappa300, latticeKappaExponent: -1 }) as const;
// Invented families in the range of the demo lab's (server/db/seed/demo-data.ts), one band each.
const P = band('p', 1.0, 350, 1.0);
const N = band('n', 1.1, 300, 1.3);
const bounds = { minPerCm3: 1e18, maxPerCm3: 1e20 };
const caseJson = { hotSide: TH, p: { length: L, area: AREA, material: P, bounds, controlPoints: 4 }, n: { length: L, area: AREA, material: N, bounds, controlPoints: 4 } };

describe('a matched couple of graded legs', () => {
  const result = runCouple(parseCoupleCase(caseJson));

  test('is at least as good as each leg optimised alone, assembled at the best common current', () => {
    const alone = (side: 'p' | 'n') => {
      const r = optimizeLeg(parseCase({ hotSide: TH, length: L, area: AREA, material: side === 'p' ? P : N, bounds, controlPoints: 4 }, 'optimize'));
      return r.doping as { x: number[]; perCm3: number[] };
    };
    const p = alone('p');
    const n = alone('n');
    for (const ratio of [1, result.areaRatio]) {
      const ap = (2 * AREA) / (1 + ratio);
      const leg = (material: typeof P | typeof N, doping: { x: number[]; perCm3: number[] }, area: number): LegDefinition => parseLegDefinition({ length: L, area, material, doping }, TH);
      // The couple's largest ΔT over all currents (module.ts, Brent on ΔT(I)).
      const assembled = moduleDeltaTCurve({ p: leg(P, p, ap), n: leg(N, n, 2 * AREA - ap) }, { hotSide: TH }, { points: 2 });
      expect(result.deltaT).toBeGreaterThanOrEqual(TH - assembled.deltaTMax.coldSide - 1e-6);
    }
  });

  test('a brute-force grid over (ratio, current) for its profiles never beats it', () => {
    const legAt = (side: 'p' | 'n', area: number) => legFromDefinition(parseLegDefinition({ ...result[side].leg, area }, TH));
    let best = -Infinity;
    for (let i = 0; i <= 12; i++) {
      const ratio = result.areaRatio * Math.pow(3, (i - 6) / 6);
      const ap = (2 * AREA) / (1 + ratio);
      const solver = deviceSolver({ legs: [{ leg: legAt('p', ap), count: 1 }, { leg: legAt('n', 2 * AREA - ap), count: 1 }], coldPlateResistance: 0, hotPlateResistance: 0 }, 1e-9);
      for (let j = 0; j <= 12; j++) {
        const point = solver.at(result.current * (0.7 + (0.6 * j) / 12), TH, { heatLoad: 0 });
        if (point) best = Math.max(best, TH - point.coldJunction);
      }
    }
    expect(best).toBeGreaterThan(result.deltaT - 1);
    expect(best).toBeLessThanOrEqual(result.deltaT + 1e-7);
  });

  test('reports each leg as a module leg, its profile, and the mismatch of the shared current', () => {
    for (const side of ['p', 'n'] as const) {
      const r = result[side];
      expect(r.optimised).toBe(true);
      expect(r.doping?.x).toEqual([0, 1 / 3, 2 / 3, 1]);
      expect(r.currentDensity).toBeCloseTo(result.current / r.area, 6);
      expect(r.ownCurrentDensity).toBeGreaterThan(0);
      expect(parseLegDefinition(r.leg, TH).area).toBe(r.area);
    }
    expect(result.areaRatio).toBeCloseTo(result.n.area / result.p.area, 12);
    expect(result.mismatch.cost).toBeGreaterThanOrEqual(0);
    expect(result.mismatch.separateObjective).toBeCloseTo(result.deltaT + result.mismatch.cost, 9);
    expect(result.power).toBeCloseTo(result.voltage * result.current, 12);
  });
});
