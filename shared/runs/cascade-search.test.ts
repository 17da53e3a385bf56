import { parseCascadeCase } from '../engine/cascade-case';
import { cascadeAt } from '../engine/cascade';
import { cascadeSearch, type CascadeCheckpoint } from './cascade-search';
import { SearchStoppedEarly, type SearchProgress } from './global-search';

// Constant-property legs (as in shared/engine/cascade.test.ts), so each start is quick.
const leg = (seebeck: number, sigma: number, kappa: number, area: number) => ({ length: 1e-3, area, segments: [{ fraction: 1, seebeck, sigma, kappa }] });
const stage = (couples: number, interfaceResistance: number) => ({ couples, p: leg(210e-6, 1.1e5, 1.45, 1e-6), n: leg(-190e-6, 0.95e5, 1.6, 1.3e-6), interfaceResistance });
const twoStages = { hotSide: 300, heatLoad: 0.005, stages: [stage(4, 0.2), stage(16, 0.05)], optimizeCouples: { total: 20 } };

describe('cascadeSearch', () => {
  const c = parseCascadeCase(twoStages);

  it('never does worse than its first start, checkpoints every start, and resumes from a checkpoint to the same answer', () => {
    const checkpoints: CascadeCheckpoint[] = [];
    const full = cascadeSearch(c, { starts: 3, seed: 'cascade-7', onCheckpoint: (cp) => checkpoints.push(JSON.parse(JSON.stringify(cp))) });
    expect(checkpoints.map((cp) => cp.nextStart)).toEqual([1, 2, 3]);
    expect(full.startsDone).toBe(3);
    expect(full.result.deltaT).toBeGreaterThanOrEqual((checkpoints[0].best?.deltaT ?? Infinity) - 1e-12);
    // Whole couples within the total, and the kept result is a real steady state of the cascade it names.
    const counts = full.result.stages.map((s) => s.couples);
    expect(counts.every((n) => Number.isInteger(n) && n >= 1)).toBe(true);
    expect(counts.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(20);
    const again = cascadeAt({ stages: c.stages.map((s, k) => ({ ...s, couples: counts[k] })) }, full.result.stages[0].current, 300, { heatLoad: 0.005 });
    expect(again?.coldSide).toBeCloseTo(full.result.coldSide, 6);
    const resumed = cascadeSearch(c, { starts: 3, seed: 'cascade-7', resume: checkpoints[1] });
    expect(resumed.result.deltaT).toBeCloseTo(full.result.deltaT, 9);
    expect(resumed.bestStart).toBe(full.bestStart);
    // Same seed, same starts.
    expect(cascadeSearch(c, { starts: 3, seed: 'cascade-7' }).result.deltaT).toBe(full.result.deltaT);
  });

  it('stops when asked, keeping the best so far; stopped before any result it throws SearchStoppedEarly', () => {
    let calls = 0;
    const r = cascadeSearch(c, { starts: 4, seed: 'x', shouldStop: () => ++calls > 40 });
    expect(r.stopped).toBe(true);
    expect(r.startsDone).toBeLessThan(4);
    expect(Number.isFinite(r.result.deltaT)).toBe(true);
    expect(() => cascadeSearch(c, { starts: 2, seed: 'x', shouldStop: () => true })).toThrow(SearchStoppedEarly);
  });

  it('for the least power, never reports as "best" a power at which the load is not held at the cold side', () => {
    // With the counts optimised and with them fixed (then the feasibility phase keeps whole-couple points).
    for (const optimizeCouples of [{ total: 20 }, undefined]) {
      const m = parseCascadeCase({ ...twoStages, optimizeCouples, objective: 'minPower', coldSide: 250 });
      const progress: SearchProgress[] = [];
      const r = cascadeSearch(m, { starts: 2, seed: 'p', onProgress: (p) => progress.push(p) });
      expect(r.result.coldSide).toBeLessThanOrEqual(250 + 1e-6);
      expect(progress.length).toBeGreaterThan(0);
      // The feasibility phase maximises ΔT at the load; its power is not a power that holds 250 K.
      expect(progress.filter((p) => p.phase === 'feasible')).toEqual([]);
      // Every figure reported as best is at least the final least power (a lower one would be a point that fails the load).
      for (const p of progress) expect(p.best).toBeGreaterThanOrEqual(r.result.power * (1 - 1e-9));
    }
  });

  it('a cascade with nothing to vary runs one start', () => {
    const fixed = parseCascadeCase({ ...twoStages, optimizeCouples: undefined, current: 1.5 });
    expect(cascadeSearch(fixed, { starts: 5, seed: 'y' }).startsDone).toBe(1);
  });
});
