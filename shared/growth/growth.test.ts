import { parseCase, optimizeLeg, propertiesAt } from '../engine';
import { familyFromMaterial } from '../engine/check-case';
import { predictAsGrown, zoneVerdicts } from './as-grown';
import { invertDoping } from './invert-doping';
import { zoneTolerances } from './zone-tolerance';
import { problemOf, scoreLayout, zoneProfile } from './zoning';

/** The demo p-type band family (typical (Bi,Sb)₂Te₃ values, from memory) on an invented 1.5 mm × 1 mm² leg. */
const material = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const caseJson = { hotSide: 300, length: 1.5e-3, area: 1e-6, material, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 11 };

const optimum = optimizeLeg(parseCase(caseJson, 'optimize'));
const continuous = { x: optimum.doping!.x, log10: optimum.doping!.perCm3.map(Math.log10) };
const steps = zoneProfile(parseCase(caseJson, 'optimize'), { maxZones: 5, minZoneFraction: 0.1, continuous });

describe('zoning', () => {
  it('one zone is the best uniform leg', () => {
    const uniform = optimum.baselines && 'perCm3' in optimum.baselines.uniform ? optimum.baselines.uniform : null;
    expect(Math.abs(steps[0]!.score.deltaT - uniform!.deltaT)).toBeLessThan(0.01);
  });

  it('ΔT never falls as zones are added, and approaches the continuous optimum from below', () => {
    const dts = steps.map((s) => s.score.deltaT);
    expect(steps.map((s) => s.zones)).toEqual([1, 2, 3, 4, 5]);
    for (let k = 1; k < dts.length; k += 1) expect(dts[k]!).toBeGreaterThanOrEqual(dts[k - 1]! - 1e-9);
    expect(dts[4]!).toBeLessThanOrEqual(optimum.deltaT + 1e-6);
    // Two zones already recover a good part of the grading gain (engine figures: uniform 73.2 K, continuous 87.3 K).
    expect(dts[1]! - dts[0]!).toBeGreaterThan(2);
  });

  it('respects the minimum zone length and sums to the whole leg', () => {
    for (const s of steps) {
      expect(s.layout.fractions.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
      for (const f of s.layout.fractions) expect(f).toBeGreaterThanOrEqual(0.1 - 1e-12);
    }
  });
});

describe('tolerance bands', () => {
  it('re-solving the leg at each band edge loses no more than the budget', () => {
    const p = problemOf(parseCase(caseJson, 'optimize'), 1e-8);
    const step = steps[2]!;
    const bands = zoneTolerances(p, step.layout, step.score, 1);
    expect(bands).toHaveLength(3);
    for (const b of bands) {
      expect(b.lowPerCm3).toBeLessThanOrEqual(b.perCm3);
      expect(b.highPerCm3).toBeGreaterThanOrEqual(b.perCm3);
      for (const [edge, k] of [[b.lowPerCm3, b.zone], [b.highPerCm3, b.zone]] as const) {
        const z = { ...step.layout, log10: step.layout.log10.map((v, i) => (i === k ? Math.log10(edge) : v)) };
        const loss = step.score.value - scoreLayout(p, z, step.score.current).value;
        expect(loss).toBeLessThanOrEqual(1 + 1e-6);
      }
      // The bands hold jointly (joint-bands.test.ts), so one zone alone at its edge loses less than the budget.
      expect(b.lossAtHigh).toBeLessThan(1);
      expect(b.lossAtLow).toBeLessThan(1);
    }
  });
});

describe('as-grown measurements', () => {
  const family = familyFromMaterial(material);

  it('inverts S and σ measured from a known doping back to it', () => {
    for (const n of [2e18, 1.3e19, 7e19]) {
      const m = propertiesAt(family, n, 300);
      const both = invertDoping(family, 300, { seebeck: m.seebeck, sigma: m.sigma }, 18, 20);
      expect(Math.log10(both.perCm3)).toBeCloseTo(Math.log10(n), 6);
      expect(both.disagreement!).toBeLessThan(1e-6);
      expect(Math.log10(invertDoping(family, 300, { seebeck: m.seebeck }, 18, 20).perCm3)).toBeCloseTo(Math.log10(n), 6);
      expect(Math.log10(invertDoping(family, 300, { sigma: m.sigma }, 18, 20).perCm3)).toBeCloseTo(Math.log10(n), 6);
    }
  });

  it('says when S and σ disagree, or lie beyond the family', () => {
    const a = propertiesAt(family, 3e18, 300);
    const b = propertiesAt(family, 3e19, 300);
    expect(invertDoping(family, 300, { seebeck: a.seebeck, sigma: b.sigma }, 18, 20).disagreement!).toBeCloseTo(1, 4);
    expect(invertDoping(family, 300, { seebeck: 5e-3 }, 18, 20).outOfRange).toBe(true);
  });

  it('a piece grown exactly to target predicts the target, and flags a zone grown off it', () => {
    const p = problemOf(parseCase(caseJson, 'optimize'), 1e-8);
    const uniform = steps[0]!;
    const points = [0.1, 0.3, 0.5, 0.7, 0.9].map((f) => ({ positionFraction: f, log10: uniform.layout.log10[0]! }));
    const pred = predictAsGrown(p, points, uniform.score.current);
    expect(pred.atDesignCurrent.deltaT).toBeCloseTo(uniform.score.deltaT, 6);
    const three = steps[2]!;
    const bands = zoneTolerances(p, three.layout, three.score, 1);
    const mids: number[] = [];
    three.layout.fractions.reduce((start, f) => { mids.push(start + f / 2); return start + f; }, 0);
    const grown = mids.map((f, k) => ({ positionFraction: f, log10: k === 1 ? Math.log10(bands[1]!.highPerCm3) + 0.2 : three.layout.log10[k]!, readings: 2, outside: 0 }));
    expect(zoneVerdicts(three.layout, bands, grown).map((v) => v.verdict)).toEqual(['within', 'high', 'within']);
    // A zone whose mean is on target but holds a reading outside the band is not "within".
    const stray = grown.map((q, k) => (k === 2 ? { ...q, outside: 1 } : q));
    const verdicts = zoneVerdicts(three.layout, bands, stray);
    expect(verdicts.map((v) => v.verdict)).toEqual(['within', 'high', 'stray']);
    expect(verdicts[2]).toMatchObject({ readings: 2, readingsOutside: 1, points: 1 });
  });
});
