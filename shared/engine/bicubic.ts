/**
 * Tensor-product cubic spline on a rectangular grid: a not-a-knot spline
 * along y through every row, then a not-a-knot spline along x through every
 * coefficient. Both steps are linear, so the result is the same whichever
 * axis goes first; it interpolates every grid value, is C² in each variable,
 * and reproduces any bicubic polynomial exactly.
 *
 * Stored as 16 coefficients per cell: value = Σ_p Σ_q c[4p+q]·dx^q·dy^p with
 * dx, dy measured from the cell's lower corner.
 */
import { findInterval, splineCoefficients } from './cubic-spline';

export type BicubicPatches = {
  xs: Float64Array;
  ys: Float64Array;
  coefficients: Float64Array;
};

/** values[i][j] is the value at (xs[i], ys[j]); at least two points per axis. */
export function bicubicPatches(xs: ArrayLike<number>, ys: ArrayLike<number>, values: ArrayLike<ArrayLike<number>>): BicubicPatches {
  const nx = xs.length;
  const ny = ys.length;
  const cellsX = nx - 1;
  const cellsY = ny - 1;
  // Step 1: along y, per row → a[i][j·4 + p].
  const alongY = Array.from({ length: nx }, (_, i) => splineCoefficients(ys, values[i]));
  // Step 2: along x, per y-cell and power of dy.
  const coefficients = new Float64Array(cellsX * cellsY * 16);
  const column = new Float64Array(nx);
  for (let j = 0; j < cellsY; j++) {
    for (let p = 0; p < 4; p++) {
      for (let i = 0; i < nx; i++) column[i] = alongY[i][4 * j + p];
      const c = splineCoefficients(xs, column);
      for (let i = 0; i < cellsX; i++) {
        for (let q = 0; q < 4; q++) coefficients[(i * cellsY + j) * 16 + 4 * p + q] = c[4 * i + q];
      }
    }
  }
  return { xs: Float64Array.from(xs), ys: Float64Array.from(ys), coefficients };
}

/** Value at (x, y); outside the grid the edge cells extrapolate. */
export function bicubicValue(patches: BicubicPatches, x: number, y: number): number {
  const i = findInterval(patches.xs, x);
  const j = findInterval(patches.ys, y);
  return bicubicCellValue(patches, i, j, x - patches.xs[i], y - patches.ys[j]);
}

/** Value in a known cell at offsets (dx, dy) from its lower corner. */
export function bicubicCellValue(patches: BicubicPatches, i: number, j: number, dx: number, dy: number): number {
  const c = patches.coefficients;
  const o = (i * (patches.ys.length - 1) + j) * 16;
  const r0 = c[o] + dx * (c[o + 1] + dx * (c[o + 2] + dx * c[o + 3]));
  const r1 = c[o + 4] + dx * (c[o + 5] + dx * (c[o + 6] + dx * c[o + 7]));
  const r2 = c[o + 8] + dx * (c[o + 9] + dx * (c[o + 10] + dx * c[o + 11]));
  const r3 = c[o + 12] + dx * (c[o + 13] + dx * (c[o + 14] + dx * c[o + 15]));
  return r0 + dy * (r1 + dy * (r2 + dy * r3));
}
