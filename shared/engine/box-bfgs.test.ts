import { minimizeBox } from './box-bfgs';

describe('box-constrained quasi-Newton', () => {
  test('finds the Rosenbrock minimum (1, 1) from the classical start (−1.2, 1)', () => {
    // H. H. Rosenbrock, The Computer Journal 3, 175 (1960): minimum 0 at (1, 1).
    const f = (x: readonly number[]) => 100 * (x[1] - x[0] * x[0]) ** 2 + (1 - x[0]) ** 2;
    const r = minimizeBox(f, [-1.2, 1], { lower: [-5, -5], upper: [5, 5], steps: [1e-7, 1e-7], gradientTolerance: 1e-6, valueTolerance: 1e-16, maxIterations: 500 });
    // Forward differences (error ~h·f''/2) limit the attainable accuracy to ~1e-4.
    expect(r.x[0]).toBeCloseTo(1, 3);
    expect(r.x[1]).toBeCloseTo(1, 3);
    expect(r.value).toBeLessThan(1e-8);
  });

  test('stops on the bound when the unconstrained minimum lies outside the box', () => {
    // Closed form: the minimum of (x−2)² + (y+1)² + xy/10 on [0,1]² is on the corner
    // x = 1 (∂f/∂x = 2(x−2) + y/10 < 0 there) and the y-bound y = 0 (∂f/∂y = 2(y+1) + x/10 > 0).
    const f = (x: readonly number[]) => (x[0] - 2) ** 2 + (x[1] + 1) ** 2 + (x[0] * x[1]) / 10;
    const r = minimizeBox(f, [0.5, 0.5], { lower: [0, 0], upper: [1, 1], steps: [1e-7, 1e-7] });
    expect(r.x).toEqual([1, 0]);
    expect(r.reason).toBe('converged');
  });

  test('reports every iteration and honours the stop signal, keeping the point reached', () => {
    const f = (x: readonly number[]) => x.reduce((s, v, i) => s + (i + 1) * (v - 0.3) ** 2, 0);
    const seen: number[] = [];
    let calls = 0;
    const r = minimizeBox(f, [1, 1, 1, 1], {
      lower: [-2, -2, -2, -2],
      upper: [2, 2, 2, 2],
      steps: [1e-7, 1e-7, 1e-7, 1e-7],
      onIteration: (it, _x, v) => seen.push(v + 0 * it),
      shouldStop: () => ++calls > 2,
    });
    expect(r.reason).toBe('stopped');
    expect(seen).toHaveLength(2);
    expect(r.value).toBe(seen[1]);
    expect(seen[1]).toBeLessThan(seen[0]);
  });
});
