import { bicubicPatches, bicubicValue } from './bicubic';
import { splineCoefficients, splineSlope, splineValue } from './cubic-spline';

describe('not-a-knot cubic splines', () => {
  test('reproduce any cubic exactly on an uneven grid (the defining property of not-a-knot ends)', () => {
    const cubic = (x: number) => 2 - 3 * x + 0.5 * x * x - 0.25 * x ** 3;
    const xs = [0, 0.3, 1.1, 1.5, 2.6, 3, 4.2];
    const c = splineCoefficients(xs, xs.map(cubic));
    for (const x of [0.1, 0.77, 2.2, 3.9, 4.5]) {
      expect(splineValue(xs, c, x)).toBeCloseTo(cubic(x), 12);
      expect(splineSlope(xs, c, x)).toBeCloseTo(-3 + x - 0.75 * x * x, 11);
    }
  });

  test('interpolate the data and converge at fourth order on a smooth function', () => {
    const errorAt = (n: number) => {
      const xs = Array.from({ length: n }, (_, i) => (2 * i) / (n - 1));
      const c = splineCoefficients(xs, xs.map(Math.exp));
      xs.forEach((x) => expect(splineValue(xs, c, x)).toBeCloseTo(Math.exp(x), 13));
      let worst = 0;
      for (let k = 0; k <= 2000; k++) worst = Math.max(worst, Math.abs(splineValue(xs, c, k / 1000) - Math.exp(k / 1000)));
      return worst;
    };
    // Halving h divides the error by ~2⁴ = 16 (standard spline theory, e.g. de Boor, A Practical Guide to Splines, 1978).
    const ratio = errorAt(21) / errorAt(41);
    expect(ratio).toBeGreaterThan(12);
    expect(ratio).toBeLessThan(20);
  });

  test('two and three points give the line and the parabola', () => {
    const line = splineCoefficients([1, 3], [2, 6]);
    expect(splineValue([1, 3], line, 2)).toBeCloseTo(4, 14);
    const xs = [0, 1, 3];
    const parabola = splineCoefficients(xs, [0, 1, 9]);
    expect(splineValue(xs, parabola, 2)).toBeCloseTo(4, 13);
  });

  test('rejects unsorted abscissae', () => {
    expect(() => splineCoefficients([0, 2, 1], [0, 0, 0])).toThrow(/increasing/);
  });

  test('tensor-product spline reproduces a bicubic polynomial and the grid values', () => {
    const f = (x: number, y: number) => 1 + x - 2 * y + x * y * y - 0.5 * x ** 3 * y + 0.1 * y ** 3;
    const xs = [0, 0.5, 1.25, 2, 3];
    const ys = [10, 11, 13, 14.5, 16, 20];
    const p = bicubicPatches(
      xs,
      ys,
      xs.map((x) => ys.map((y) => f(x, y))),
    );
    for (const [x, y] of [
      [0.2, 10.5],
      [1.7, 15.1],
      [2.9, 19.9],
      [1.25, 13],
    ]) {
      expect(bicubicValue(p, x, y)).toBeCloseTo(f(x, y), 9);
    }
  });
});
