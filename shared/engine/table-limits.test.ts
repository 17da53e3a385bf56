import { materialSchema } from './case-schema';
import { tableBreach, tableLimits } from './table-limits';

const row = (perCm3: number, temperature: number) => ({ perCm3, temperature, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 });
/** `count` rows on `dopings` × `temperatures` grid lines, cycling through both. */
const rows = (count: number, dopings: number, temperatures: number) =>
  Array.from({ length: count }, (_, k) => row(1e18 * 10 ** ((2 * (k % dopings)) / dopings), 200 + (300 * (k % temperatures)) / temperatures));

const issues = (value: unknown) => {
  const r = materialSchema.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
};

describe('table size caps', () => {
  it('accept a full campaign grid and a table at every cap', () => {
    expect(tableBreach(rows(1200, 30, 40))).toBeNull();
    expect(tableBreach(rows(tableLimits.rows, tableLimits.dopings, tableLimits.temperatures))).toBeNull();
  });

  it('name the first cap broken and what was found', () => {
    expect(tableBreach(rows(tableLimits.rows + 1, 10, 10))).toMatchObject({ limit: 'rows', found: tableLimits.rows + 1, max: tableLimits.rows });
    expect(tableBreach(rows(2000, 2000, 10))).toMatchObject({ limit: 'dopings', found: 2000, max: tableLimits.dopings });
    expect(tableBreach(rows(2000, 10, 2000))).toMatchObject({ limit: 'temperatures', found: 2000, max: tableLimits.temperatures });
  });

  it('count dopings within a relative 1e-9 and temperatures within 1e-6 K as one grid line', () => {
    const near = [row(1e19, 300), row(1e19 * (1 + 5e-10), 300 + 5e-7), row(2e19, 300)];
    expect(tableBreach(near)).toBeNull();
  });

  it('refuse JSON tables over a cap in the shared schema, on the rows field', () => {
    expect(issues({ kind: 'table', rows: rows(tableLimits.rows + 1, 10, 10) })).toEqual([{ path: 'rows', message: expect.stringMatching(/^20001 rows; a table holds at most 20000/) }]);
    expect(issues({ kind: 'table', rows: rows(2000, 2000, 2000) })).toEqual([{ path: 'rows', message: expect.stringMatching(/^2000 different carrier concentrations; a table holds at most 200/) }]);
    expect(issues({ kind: 'table', rows: rows(400, 4, 400) })).toEqual([{ path: 'rows', message: expect.stringMatching(/^400 different temperatures; a table holds at most 300/) }]);
    expect(issues({ kind: 'table', rows: rows(16, 4, 4) })).toEqual([]);
  });
});
