/**
 * A family measured on a doping × temperature grid, interpolated by a
 * tensor-product not-a-knot cubic spline in (log10 n, T).
 *
 * What is interpolated: S itself, but ln σ and ln κ. σ spans decades across
 * the doping range and is close to a power of n, so ln σ is nearly linear in
 * log10 n and the spline stays accurate with few dopings; logs also keep σ
 * and κ positive between grid points, where a spline through σ itself can
 * overshoot below zero.
 */
import { bicubicCellValue, bicubicPatches, type BicubicPatches } from './bicubic';
import { CaseError } from './case-error';
import { findInterval } from './cubic-spline';
import type { MaterialFamily, Properties } from './material-family';
import { gridLines, lineOf } from './grid-lines';
import { breach } from './table-limits';

export type TableRow = { perCm3: number; temperature: number; seebeck: number; sigma: number; kappa: number };

/** Values closer than this (relative for doping, K for temperature) are the same grid line. */
const SAME_DOPING = 1e-9;
const SAME_TEMPERATURE = 1e-9;

/**
 * Builds the family; throws CaseError naming `${field}` (or one of its rows)
 * for a table that is not a full grid, has duplicates, or mixes signs of S.
 */
export function tableFamily(rows: readonly TableRow[], field = 'material.rows'): MaterialFamily {
  const sameDoping = (a: number, b: number) => Math.abs(a - b) <= SAME_DOPING * Math.max(a, b);
  const sameTemperature = (a: number, b: number) => Math.abs(a - b) <= SAME_TEMPERATURE;
  const dopings = gridLines(
    rows.map((r) => r.perCm3),
    sameDoping,
  );
  const temperatures = gridLines(
    rows.map((r) => r.temperature),
    sameTemperature,
  );
  // Before the dopings × temperatures index below: a sparse table must not get to allocate a huge grid.
  const over = breach('dopings', dopings.length) ?? breach('temperatures', temperatures.length);
  if (over) throw new CaseError(field, over.message);
  if (dopings.length < 2) throw new CaseError(field, 'the table needs at least two different dopings (perCm3) to interpolate between');
  if (temperatures.length < 2) throw new CaseError(field, 'the table needs at least two different temperatures to interpolate between');

  const sign = rows[0].seebeck < 0 ? -1 : 1;
  const index: number[][] = dopings.map(() => temperatures.map(() => -1));
  rows.forEach((row, k) => {
    if (row.seebeck === 0 || Math.sign(row.seebeck) !== sign) {
      throw new CaseError(`${field}[${k}].seebeck`, 'every row must have a Seebeck coefficient of the same, non-zero sign (one carrier type per family)');
    }
    const i = lineOf(dopings, row.perCm3);
    const j = lineOf(temperatures, row.temperature);
    if (index[i][j] >= 0) {
      throw new CaseError(`${field}[${k}]`, `duplicates row ${index[i][j]} (same perCm3 ${row.perCm3.toExponential()} and temperature ${row.temperature} K)`);
    }
    index[i][j] = k;
  });
  dopings.forEach((d, i) =>
    temperatures.forEach((t, j) => {
      if (index[i][j] < 0) {
        throw new CaseError(field, `no row at perCm3 = ${d.toExponential()} and temperature = ${t} K: the table must hold every doping × temperature pair of its grid`);
      }
    }),
  );

  const xs = dopings.map(Math.log10);
  const grid = (pick: (r: TableRow) => number) => dopings.map((_, i) => temperatures.map((_, j) => pick(rows[index[i][j]])));
  const seebeck = bicubicPatches(xs, temperatures, grid((r) => r.seebeck));
  const lnSigma = bicubicPatches(xs, temperatures, grid((r) => Math.log(r.sigma)));
  const lnKappa = bicubicPatches(xs, temperatures, grid((r) => Math.log(r.kappa)));
  const ys = seebeck.ys;
  const patchXs = seebeck.xs;
  const value = (p: BicubicPatches, i: number, j: number, dx: number, dy: number) => bicubicCellValue(p, i, j, dx, dy);

  return {
    kind: 'table',
    sign,
    minTemperature: temperatures[0],
    maxTemperature: temperatures[temperatures.length - 1],
    minLog10Doping: xs[0],
    maxLog10Doping: xs[xs.length - 1],
    properties(log10Doping: number, temperature: number, out: Properties) {
      const i = findInterval(patchXs, log10Doping);
      const j = findInterval(ys, temperature);
      const dx = log10Doping - patchXs[i];
      const dy = temperature - ys[j];
      out.seebeck = value(seebeck, i, j, dx, dy);
      out.sigma = Math.exp(value(lnSigma, i, j, dx, dy));
      out.kappa = Math.exp(value(lnKappa, i, j, dx, dy));
    },
  };
}
