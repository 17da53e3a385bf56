import { bandFamily } from './band-model';
import { implicitGradient, newWarmStart, scoreDesign, type Conditions } from './evaluate-design';
import { integrateLeg } from './integrate';
import { gradedLeg } from './leg-profile';
import { solveLegProblem } from './solve-leg';

const family = bandFamily({ carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
const x = [0, 0.25, 0.5, 0.75, 1];
const y = [19.5, 19.3, 19.1, 18.8, 18.3];
const leg = (log10: number[]) => gradedLeg(1e-3, 1e-6, family, x, log10);

describe('implicit gradient of the objective', () => {
  test('replaying recorded steps reproduces the adaptive integration (to rounding)', () => {
    const steps: number[] = [];
    const a = integrateLeg(leg(y), 4e6, 215, 0, { tolerance: 1e-10, fluxScale: 1e6, record: steps });
    const b = integrateLeg(leg(y), 4e6, 215, 0, { tolerance: 1e-10, fluxScale: 1e6, replay: steps });
    // step = (x + h) − x may differ from h in the last bit.
    expect(Math.abs(b.temperature - a.temperature) / a.temperature).toBeLessThan(1e-14);
    expect(Math.abs(b.flux - a.flux) / a.flux).toBeLessThan(1e-14);
    expect(b.steps).toBe(a.steps);
  });

  test.each<[string, Conditions]>([
    ['maxDeltaT', { objective: 'maxDeltaT', hotSide: 300, heatLoad: 0.01 }],
    ['maxHeatLoad', { objective: 'maxHeatLoad', hotSide: 300, heatLoad: 0, coldSide: 250 }],
  ])('%s: agrees with central differences of full solves (independent of the replay)', (_name, conditions) => {
    const current = 4;
    const score = scoreDesign(leg(y), current, conditions, newWarmStart(leg(y)), 1e-11);
    const root = conditions.objective === 'maxDeltaT' ? score.coldSide : score.heatLoad / 1e-6;
    const h = 1e-6;
    const g = implicitGradient({ leg: leg(y), current }, root, conditions, 1e-11, (i) => {
      const moved = [...y, current];
      moved[i] += h;
      return { point: { leg: leg(moved.slice(0, 5)), current: moved[5] }, step: h };
    }, 6) as number[];
    const objective = (v: number[]) => {
      const problem = { leg: leg(v.slice(0, 5)), hotSide: 300, current: v[5] };
      return conditions.objective === 'maxDeltaT'
        ? solveLegProblem({ ...problem, heatLoad: conditions.heatLoad }, { tolerance: 1e-12 }).deltaT
        : solveLegProblem({ ...problem, coldSide: 250 }, { tolerance: 1e-12 }).heatLoad;
    };
    const d = 1e-3;
    for (let i = 0; i < 6; i++) {
      const up = [...y, current];
      const down = [...y, current];
      up[i] += d;
      down[i] -= d;
      const central = (objective(up) - objective(down)) / (2 * d);
      const scale = conditions.objective === 'maxDeltaT' ? 1 : 1e-3; // K or W per unit
      expect(Math.abs(g[i] - central)).toBeLessThan(1e-4 * Math.max(Math.abs(central), scale));
    }
  });
});
