import { optimizeLeg, parseCase } from '../engine';
import { estimateYield } from './growth-yield';
import { jointZoneBands } from './zone-tolerance';
import { problemOf, zoneProfile } from './zoning';

/** The demo p-type band family (typical values, from memory) on the demo's 1.5 mm leg, zones ≥ 0.2 mm; K = 3. */
const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const caseJson = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 8 };
const c = parseCase(caseJson, 'optimize');
const optimum = optimizeLeg(c);
const three = zoneProfile(c, { maxZones: 3, minZoneFraction: 0.2 / 1.5, continuous: { x: optimum.doping!.x, log10: optimum.doping!.perCm3.map(Math.log10) } })[2]!;
const p = problemOf(c, 1e-8);
const target = { value: three.score.value, current: three.score.current };

/** Standard normal CDF (Abramowitz & Stegun 26.2.17, |error| < 7.5e-8). */
function phi(x: number): number {
  const t = 1 / (1 + 0.2316419 * Math.abs(x));
  const d = 0.3989422804014327 * Math.exp((-x * x) / 2);
  const q = d * t * (0.31938153 + t * (-0.356563782 + t * (1.781477937 + t * (-1.821255978 + t * 1.330274429))));
  return x >= 0 ? 1 - q : q;
}

describe('yield of as-grown legs', () => {
  it('is reproducible from its seed, and without scatter every leg is the design', () => {
    const a = estimateYield(p, three.layout, target, 1, 0.05, { samples: 120 });
    const b = estimateYield(p, three.layout, target, 1, 0.05, { samples: 120 });
    expect(b).toEqual(a);
    const exact = estimateYield(p, three.layout, target, 1, 0, { samples: 20 });
    expect(exact.meetsBudget).toBe(1);
    expect(exact.p05).toBeCloseTo(target.value, 6);
    expect(exact.p95).toBeCloseTo(target.value, 6);
  });

  it('falls as the scatter grows, and the histogram holds every solved leg', () => {
    const ys = [0.03, 0.1, 0.2].map((s) => estimateYield(p, three.layout, target, 1, s, { samples: 200 }));
    expect(ys[0]!.meetsBudget).toBeGreaterThan(ys[1]!.meetsBudget);
    expect(ys[1]!.meetsBudget).toBeGreaterThan(ys[2]!.meetsBudget);
    for (const y of ys) {
      expect(y.histogram.counts.reduce((a, n) => a + n, 0) + y.histogram.below).toBe(y.samples - y.infeasible);
      expect(y.histogram.edges).toHaveLength(y.histogram.counts.length + 1);
      // The budget's edge is always inside the drawn range.
      expect(y.histogram.edges[0]!).toBeLessThanOrEqual(target.value - 1);
      // At the design's optimum scatter can only cost: the median leg cools less than the design.
      expect(y.p50).toBeLessThan(target.value);
      expect(y.p05).toBeLessThanOrEqual(y.p50);
    }
  });

  it('is at least the chance that every zone lands inside its joint band (inside ⇒ within budget)', () => {
    const scatter = 0.08;
    const bands = jointZoneBands(p, three.layout, three.score, 1).tolerances;
    // Each zone's log10 n ~ N(target, σ²) independently: P(all inside) = Π [Φ(hi/σ) − Φ(lo/σ)].
    const inside = bands.reduce((acc, b) => acc * (phi(Math.log10(b.highPerCm3 / b.perCm3) / scatter) - phi(Math.log10(b.lowPerCm3 / b.perCm3) / scatter)), 1);
    const n = 400;
    const y = estimateYield(p, three.layout, target, 1, scatter, { samples: n });
    // Three binomial standard errors of slack for the finite sample.
    expect(y.meetsBudget).toBeGreaterThanOrEqual(inside - 3 * Math.sqrt((inside * (1 - inside)) / n));
    expect(inside).toBeLessThan(0.9);
  });
});
