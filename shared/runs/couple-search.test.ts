import { parseCoupleCase } from '../engine/couple-case';
import { coupleSearch, type CoupleCheckpoint } from './couple-search';
import { SearchStoppedEarly, type SearchProgress } from './global-search';

/** A graded p leg (3 nodes, invented band family) with a constant n leg; ratio and current free. */
const caseJson = {
  hotSide: 300,
  p: {
    length: 1.2e-3, area: 1e-6,
    material: { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 },
    bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 3,
  },
  n: { length: 1.2e-3, area: 1e-6, material: { kind: 'constant', seebeck: -190e-6, sigma: 0.95e5, kappa: 1.6 } },
};

describe('coupleSearch', () => {
  const c = parseCoupleCase(caseJson);

  it('never does worse than its first start, reports progress with the p leg’s nodes, and resumes from a checkpoint to the same answer', () => {
    const checkpoints: CoupleCheckpoint[] = [];
    const progress: SearchProgress[] = [];
    const full = coupleSearch(c, { starts: 3, seed: 'run-7', onCheckpoint: (cp) => checkpoints.push(JSON.parse(JSON.stringify(cp))), onProgress: (p) => progress.push(p) });
    expect(checkpoints.map((cp) => cp.nextStart)).toEqual([1, 2, 3]);
    expect(full.startsDone).toBe(3);
    expect(full.result.objective.value).toBeGreaterThanOrEqual((checkpoints[0].best?.objective.value ?? Infinity) - 1e-12);
    const last = progress[progress.length - 1];
    expect(last.state).toEqual({ kind: 'doping', perCm3: expect.any(Array), current: expect.any(Number) });
    expect(last.state?.kind === 'doping' ? last.state.perCm3 : []).toHaveLength(3);
    expect(last.starts).toBe(3);
    expect(progress.every((p) => p.fractionDone >= 0 && p.fractionDone <= 1)).toBe(true);
    const resumed = coupleSearch(c, { starts: 3, seed: 'run-7', resume: checkpoints[1] });
    expect(resumed.result.objective.value).toBeCloseTo(full.result.objective.value, 9);
    expect(resumed.bestStart).toBe(full.bestStart);
  });

  it('stops when asked, keeping the best so far; stopped before any design it throws SearchStoppedEarly', () => {
    let calls = 0;
    const r = coupleSearch(c, { starts: 4, seed: 'x', shouldStop: () => ++calls > 60 });
    expect(r.stopped).toBe(true);
    expect(r.startsDone).toBeLessThan(4);
    expect(Number.isFinite(r.result.deltaT)).toBe(true);
    expect(() => coupleSearch(c, { starts: 2, seed: 'x', shouldStop: () => true })).toThrow(SearchStoppedEarly);
  });

  it('a couple with no optimised profile runs one start', () => {
    const fixed = parseCoupleCase({ ...caseJson, p: { ...caseJson.p, bounds: undefined, controlPoints: undefined, doping: 2e19 } });
    const r = coupleSearch(fixed, { starts: 5, seed: 'y' });
    expect(r.startsDone).toBe(1);
  });
});
