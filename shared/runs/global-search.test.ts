import { dopingBaselines, optimizeLeg, parseCase } from '../engine';
import { runProgressSchema } from '../api/runs';
import { globalSearch, type SearchCheckpoint, type SearchProgress } from './global-search';
import { runProgressOf } from './run-progress';

/** The benchmark family (p-type, m* = 1, μ300 = 350 cm²/(V·s), κL300 = 1 W/(m·K)); invented leg geometry. */
const caseJson = {
  hotSide: 300, length: 1.5e-3, area: 1e-6,
  material: { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 },
  bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 6,
};

describe('globalSearch', () => {
  it('never does worse than a single start and never worse than the best uniform leg', () => {
    const c = parseCase(caseJson, 'optimize');
    const one = globalSearch(c, { starts: 1, seed: 'a' });
    const many = globalSearch(c, { starts: 4, seed: 'a' });
    expect(many.result.objective.value).toBeGreaterThanOrEqual(one.result.objective.value - 1e-9);
    const uniform = many.result.baselines && 'perCm3' in many.result.baselines.uniform ? many.result.baselines.uniform.deltaT : NaN;
    expect(many.result.deltaT).toBeGreaterThanOrEqual(uniform);
    expect(many.startsDone).toBe(4);
  });

  it('resumes from a checkpoint to the same answer as an uninterrupted search', () => {
    const c = parseCase(caseJson, 'optimize');
    const checkpoints: SearchCheckpoint[] = [];
    const full = globalSearch(c, { starts: 3, seed: 'run-42', onCheckpoint: (cp) => checkpoints.push(JSON.parse(JSON.stringify(cp))) });
    expect(checkpoints.map((cp) => cp.nextStart)).toEqual([1, 2, 3]);
    const resumed = globalSearch(c, { starts: 3, seed: 'run-42', resume: checkpoints[1] });
    expect(resumed.result.objective.value).toBeCloseTo(full.result.objective.value, 9);
    expect(resumed.bestStart).toBe(full.bestStart);
  });

  it('stops when asked and keeps the best so far', () => {
    const c = parseCase(caseJson, 'optimize');
    let calls = 0;
    const r = globalSearch(c, { starts: 5, seed: 'x', shouldStop: () => { calls += 1; return calls > 40; } });
    expect(r.stopped).toBe(true);
    expect(r.startsDone).toBeLessThan(5);
    expect(Number.isFinite(r.result.deltaT)).toBe(true);
  });

  it('reports a progress estimate that rises to the end', () => {
    const c = parseCase(caseJson, 'optimize');
    const seen: number[] = [];
    globalSearch(c, { starts: 2, seed: 'p', onProgress: (p) => seen.push(p.fractionDone) });
    expect(seen.length).toBeGreaterThan(3);
    expect(Math.max(...seen)).toBeLessThanOrEqual(1);
    expect(seen[seen.length - 1]!).toBeGreaterThan(0.5);
  });

  it('reports the best with its own current, and the start being searched with its own', () => {
    const c = parseCase(caseJson, 'optimize');
    const reports: SearchProgress[] = [];
    const bestBefore: Array<{ value: number; current: number } | null> = [null];
    globalSearch(c, {
      starts: 4, seed: 'pairs',
      onProgress: (p) => reports.push({ ...p, state: p.state && { ...p.state } }),
      onCheckpoint: (cp) => bestBefore.push(cp.best && { value: cp.best.objective.value, current: cp.best.current }),
    });
    let earlierHeldBest = 0;
    for (const p of reports) {
      const earlier = bestBefore[p.start];
      if (earlier && earlier.value > p.startBest) {
        // An earlier start holds the best: its value and its current, not the current this start tries.
        earlierHeldBest += 1;
        expect(p.best).toBe(earlier.value);
        expect(p.bestCurrent).toBe(earlier.current);
      } else {
        expect(p.best).toBe(p.startBest);
        expect(p.bestCurrent).toBe(p.state?.current ?? null);
      }
    }
    // The case the pairing exists for happened: random starts begin below the best found.
    expect(earlierHeldBest).toBeGreaterThan(0);
    const mixed = reports.find((p) => p.start > 0 && p.best > p.startBest && p.state && Math.abs(p.state.current - (p.bestCurrent ?? 0)) > 1e-3);
    expect(mixed).toBeDefined();
    // The payload keeps them apart too.
    const payload = runProgressSchema.parse(runProgressOf('3f1c2a8e-0d4b-4a51-9a43-5c1f6a0b7e21', mixed!, 12.5, new Date('2026-02-01T10:00:00Z')));
    expect(payload.bestCurrent).toBe(mixed!.bestCurrent);
    expect(payload.start).toEqual({ number: mixed!.start + 1, of: 4, best: mixed!.startBest, current: mixed!.state!.current });
    expect(payload.best).toBeGreaterThan(payload.start!.best);
  });

  it('computes the baselines once: reusing them changes nothing but the work done', () => {
    const c = parseCase(caseJson, 'optimize');
    const baselines = dopingBaselines(c);
    if (!baselines) throw new Error('a band family has baselines');
    const fresh = optimizeLeg(c);
    const reused = optimizeLeg(c, { baselines });
    expect(reused.objective.value).toBe(fresh.objective.value);
    expect(reused.doping?.perCm3).toEqual(fresh.doping?.perCm3);
    expect(reused.baselines).toEqual(fresh.baselines);
    expect(fresh.evaluations - reused.evaluations).toBe(baselines.evaluations);
  });

  it('searches a later start from its own profile alone, never ending below the best uniform leg', () => {
    const c = parseCase(caseJson, 'optimize');
    const baselines = dopingBaselines(c);
    const start = { kind: 'doping' as const, perCm3: [1e20, 1e20, 1e20, 1e20, 1e20, 1e20], current: 1 };
    const both = optimizeLeg(c, { baselines, start });
    const alone = optimizeLeg(c, { baselines, startOnly: true, start });
    expect(alone.evaluations).toBeLessThan(both.evaluations);
    expect(alone.objective.value).toBeGreaterThanOrEqual(baselines!.uniform.score.value);
  });

  it('gives a random start its own current first, so one far beyond any steady state still converges', () => {
    const c = parseCase(caseJson, 'optimize');
    const baselines = dopingBaselines(c)!;
    // 40 A is ten times this leg's best current (~4–6 A): Joule heat swamps the Peltier cooling there.
    const r = optimizeLeg(c, { baselines, startOnly: true, start: { kind: 'doping', perCm3: [1e18, 1e18, 1e18, 1e18, 1e18, 1e18], current: 40 } });
    expect(r.current).toBeLessThan(20);
    expect(r.objective.value).toBeGreaterThanOrEqual(baselines.uniform.score.value);
    expect(r.evaluations).toBeLessThan(1000);
  });
});
