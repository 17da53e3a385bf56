import { familyFromMaterial } from '../engine/check-case';
import { propertiesAt } from '../engine/family-helpers';
import { tableLimits } from '../engine/table-limits';
import { issuesListed, parseTableCsv, TableLimitError } from './parse-table-csv';

/** A small full grid with invented, plausible values (µV/K, S/cm, W/(m·K)). */
function grid(opts: { dopings?: number[]; temps?: number[]; sep?: string } = {}): string {
  const dopings = opts.dopings ?? [1e18, 3e18, 1e19, 3e19];
  const temps = opts.temps ?? [250, 300, 350];
  const sep = opts.sep ?? ',';
  const lines = [['n_per_cm3', 'temperature_K', 'seebeck_uV_per_K', 'sigma_S_per_cm', 'kappa_W_per_m_K'].join(sep)];
  for (const n of dopings) for (const t of temps) {
    const s = 250 - 60 * Math.log10(n / 1e18) + 0.2 * (t - 300);
    const sigma = 100 * (n / 1e18) * (300 / t);
    lines.push([n.toExponential(3), t, s.toFixed(2), sigma.toFixed(3), (1.2 + sigma / 5000).toFixed(4)].join(sep));
  }
  return lines.join('\n');
}

describe('parseTableCsv: a valid table', () => {
  it('converts every column to engine units and maps the grid', () => {
    const p = parseTableCsv(grid());
    expect(p.errors).toEqual([]);
    expect(p.ok).toBe(true);
    expect(p.rowCount).toBe(12);
    expect(p.carrier).toBe('p');
    const first = p.rows[0]!;
    expect(first.line).toBe(2);
    expect(first.perCm3).toBeCloseTo(1e18, -12);
    expect(first.seebeck).toBeCloseTo((250 + 0.2 * -50) * 1e-6, 12); // µV/K → V/K
    expect(first.sigma).toBeCloseTo(100 * (300 / 250) * 100, 6); // S/cm → S/m
    expect(p.coverage.dopings).toHaveLength(4);
    expect(p.coverage.temperatures).toEqual([250, 300, 350]);
    expect(p.coverage.present!.flat().every(Boolean)).toBe(true);
    expect(p.coverage).toMatchObject({ measured: 12, holes: 0, firstHoles: [] });
    expect(p.columns.map((c) => c.unit)).toEqual(['cm⁻³', 'K', 'µV/K', 'S/cm', 'W/(m·K)']);
  });

  it('reads semicolons, °C, resistivity in µΩ·m and mΩ·cm, and headers in any order and case', () => {
    const uohm = parseTableCsv(['Temperature_C;Seebeck_µV_per_K;resistivity_uOhm_m;KAPPA_W_per_m_K;n_per_cm3', '26.85;200;10;1.5;1e19', '76.85;210;12;1.4;1e19', '26.85;150;5;1.6;3e19', '76.85;160;6;1.5;3e19'].join('\n'));
    expect(uohm.errors).toEqual([]);
    expect(uohm.rows[0]!.temperature).toBeCloseTo(300, 9);
    expect(uohm.rows[0]!.sigma).toBeCloseTo(1e5, 6); // 10 µΩ·m = 1e-5 Ω·m → 1e5 S/m
    const mohm = parseTableCsv(['n_per_cm3,temperature_K,seebeck_uV_per_K,resistivity_mOhm_cm,kappa_W_per_m_K', '1e19,300,200,1,1.5', '1e19,350,210,1.2,1.4', '3e19,300,150,0.5,1.6', '3e19,350,160,0.6,1.5'].join('\n'));
    expect(mohm.rows[0]!.sigma).toBeCloseTo(1e5, 6); // 1 mΩ·cm = 1e-5 Ω·m
  });

  it('builds an engine family that reproduces the measured points at the grid', () => {
    const p = parseTableCsv(grid());
    const fam = familyFromMaterial({ kind: 'table', rows: p.rows.map(({ line: _l, ...r }) => r) });
    for (const r of p.rows) {
      const at = propertiesAt(fam, r.perCm3, r.temperature);
      expect(at.seebeck).toBeCloseTo(r.seebeck, 9);
      expect(at.sigma / r.sigma).toBeCloseTo(1, 9);
    }
  });

  it('reads n-type tables as carrier n', () => {
    const text = grid().split('\n').map((l, i) => (i === 0 ? l : l.replace(/^([^,]+,[^,]+,)/, '$1-'))).join('\n');
    const p = parseTableCsv(text);
    expect(p.ok).toBe(true);
    expect(p.carrier).toBe('n');
  });
});

describe('parseTableCsv: bad input names the line and column', () => {
  it('an empty file', () => {
    expect(parseTableCsv('').errors[0]!.message).toMatch(/empty/);
    expect(parseTableCsv('\n\n  \n').ok).toBe(false);
  });

  it('a header without data', () => {
    expect(parseTableCsv('n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K\n').errors[0]!.message).toMatch(/no data rows/);
  });

  it('a wrong delimiter', () => {
    expect(parseTableCsv(grid().replace(/,/g, '\t')).errors[0]!.message).toMatch(/tabs/);
    expect(parseTableCsv(grid().replace(/,/g, '|')).errors[0]!.message).toMatch(/"\|"/);
  });

  it('a header without a recognised unit is an error, never a guess', () => {
    const p = parseTableCsv(grid().replace('seebeck_uV_per_K', 'seebeck'));
    expect(p.ok).toBe(false);
    expect(p.errors[0]).toMatchObject({ line: 1, column: 'seebeck' });
    expect(p.errors[0]!.message).toMatch(/uv_per_k/);
    expect(parseTableCsv(grid().replace('kappa_W_per_m_K', 'kappa_mW_per_cm_K')).errors[0]!.message).toMatch(/not one we convert/);
  });

  it('a missing quantity', () => {
    const text = grid().split('\n').map((l) => l.split(',').slice(0, 4).join(',')).join('\n');
    expect(parseTableCsv(text).errors.map((e) => e.message).join(' ')).toMatch(/missing column: thermal conductivity/);
  });

  it('text, NaN and Infinity in numeric cells', () => {
    const lines = grid().split('\n');
    lines[3] = lines[3]!.replace(/,[^,]+$/, ',abc');
    lines[5] = lines[5]!.replace(/^([^,]+,[^,]+,)[^,]+/, '$1NaN');
    lines[7] = lines[7]!.replace(/^([^,]+,)[^,]+/, '$1Infinity');
    const p = parseTableCsv(lines.join('\n'));
    expect(p.ok).toBe(false);
    expect(p.errors).toEqual(expect.arrayContaining([
      expect.objectContaining({ line: 4, column: 'kappa_W_per_m_K', message: expect.stringMatching(/"abc" is not a number/) }),
      expect.objectContaining({ line: 6, column: 'seebeck_uV_per_K', message: expect.stringMatching(/not a finite number/) }),
      expect.objectContaining({ line: 8, column: 'temperature_K', message: expect.stringMatching(/not a finite number/) }),
    ]));
  });

  it('a decimal comma in a semicolon file', () => {
    const p = parseTableCsv(grid({ sep: ';' }).replace(/;1\.2/, ';1,2'));
    expect(p.errors[0]!.message).toMatch(/decimal comma/);
  });

  it('a row with the wrong number of cells', () => {
    const lines = grid().split('\n');
    lines[2] = `${lines[2]},7`;
    expect(parseTableCsv(lines.join('\n')).errors[0]).toMatchObject({ line: 3, message: expect.stringMatching(/6 cells where the header has 5/) });
  });

  it('duplicate grid points', () => {
    const lines = grid().split('\n');
    lines.push(lines[1]!);
    const p = parseTableCsv(lines.join('\n'));
    expect(p.errors[0]).toMatchObject({ line: 14, message: expect.stringMatching(/already on line 2/) });
  });

  it('a ragged grid the engine cannot interpolate', () => {
    const lines = grid().split('\n');
    lines.splice(5, 1); // drop n = 3e18 at 300 K
    const p = parseTableCsv(lines.join('\n'));
    expect(p.ok).toBe(false);
    expect(p.errors[0]!.message).toMatch(/hole.*3\.00e\+18 cm⁻³ at 300 K/);
    expect(p.coverage.present!.flat().filter((x) => !x)).toHaveLength(1);
    expect(p.coverage).toMatchObject({ measured: 11, holes: 1, firstHoles: [{ perCm3: 3e18, temperature: 300 }] });
  });

  it('doping off by 10⁶ (m⁻³ written under a cm⁻³ header) is refused', () => {
    const p = parseTableCsv(grid({ dopings: [1e24, 3e24, 1e25, 3e25] }));
    expect(p.ok).toBe(false);
    expect(p.errors[0]).toMatchObject({ line: 2, column: 'n_per_cm3' });
    expect(p.errors[0]!.message).toMatch(/m⁻³ is 10⁶ too large/);
  });

  it('negative conductivity and mixed Seebeck signs', () => {
    const neg = grid().split('\n');
    neg[2] = neg[2]!.replace(/^([^,]+,[^,]+,[^,]+,)/, '$1-');
    expect(parseTableCsv(neg.join('\n')).errors[0]).toMatchObject({ line: 3, column: 'sigma_S_per_cm' });
    const mixed = grid().split('\n');
    mixed[4] = mixed[4]!.replace(/^([^,]+,[^,]+,)/, '$1-');
    const p = parseTableCsv(mixed.join('\n'));
    expect(p.ok).toBe(false);
    expect(p.errors[0]).toMatchObject({ line: 5 });
    expect(p.errors[0]!.message).toMatch(/same, non-zero sign/);
  });
});

describe('parseTableCsv: warnings that do not block saving', () => {
  it('a Seebeck coefficient of 0.0002 under a µV/K header is flagged as probably V/K', () => {
    const lines = grid().split('\n');
    lines[1] = lines[1]!.replace(/^([^,]+,[^,]+,)[^,]+/, '$10.0002');
    const p = parseTableCsv(lines.join('\n'));
    // 0.0002 µV/K is a legal (tiny) number, so the table may be saved; the user is warned.
    expect(p.ok).toBe(true);
    expect(p.warnings).toEqual([expect.objectContaining({ line: 2, column: 'seebeck_uV_per_K', message: expect.stringMatching(/V\/K under a µV\/K header/) })]);
    expect(parseTableCsv(grid()).warnings).toEqual([]);
  });

  it('a conductivity column that is really a resistivity is flagged', () => {
    const text = grid().split('\n').map((l, i) => (i === 0 ? l : l.replace(/^([^,]+,[^,]+,[^,]+,)[^,]+/, '$10.01'))).join('\n');
    const p = parseTableCsv(text);
    expect(p.warnings[0]).toMatchObject({ column: 'sigma_S_per_cm', message: expect.stringMatching(/in 12 rows.*resistivity/) });
  });

  it('sparse regions of the grid', () => {
    const p = parseTableCsv(grid({ dopings: [1e18, 2e18, 3e18, 1e20], temps: [250, 275, 300, 400] }));
    expect(p.ok).toBe(true);
    const text = p.warnings.map((w) => w.message).join('\n');
    expect(text).toMatch(/between 3\.00e\+18 and 1\.00e\+20 cm⁻³/);
    expect(text).toMatch(/between 300 K and 400 K/);
  });

  it('unknown extra columns are ignored with a warning', () => {
    const text = grid().split('\n').map((l, i) => `${l},${i === 0 ? 'sample_id' : `S${i}`}`).join('\n');
    const p = parseTableCsv(text);
    expect(p.ok).toBe(true);
    expect(p.warnings[0]).toMatchObject({ column: 'sample_id' });
  });
});

/** Rows whose dopings and temperatures are all different: a grid of rows × rows cells with only the diagonal measured. */
function sparse(rows: number, opts: { dopings?: number; temperatures?: number } = {}): string {
  const lines = ['n_per_cm3,temperature_K,seebeck_uV_per_K,sigma_S_per_cm,kappa_W_per_m_K'];
  const dopings = opts.dopings ?? rows;
  const temperatures = opts.temperatures ?? rows;
  for (let k = 0; k < rows; k++) lines.push(`${(1e18 * 10 ** ((2 * (k % dopings)) / dopings)).toExponential(8)},${(200 + (300 * (k % temperatures)) / temperatures).toFixed(4)},200,1000,1.5`);
  return lines.join('\n');
}

const refusal = (text: string): TableLimitError => {
  try {
    parseTableCsv(text);
  } catch (err) {
    if (err instanceof TableLimitError) return err;
    throw err;
  }
  throw new Error('the file was not refused');
};

describe('parseTableCsv: size caps, checked before the grid is built', () => {
  it('refuses more distinct dopings than a table holds, naming the cap and the count', () => {
    const err = refusal(sparse(2000, { temperatures: 10 }));
    expect(err.breach).toMatchObject({ limit: 'dopings', found: 2000, max: tableLimits.dopings });
    expect(err.message).toMatch(/2000 different carrier concentrations; a table holds at most 200/);
  });

  it('refuses more distinct temperatures than a table holds', () => {
    const err = refusal(sparse(1000, { dopings: 10 }));
    expect(err.breach).toMatchObject({ limit: 'temperatures', found: 1000, max: tableLimits.temperatures });
  });

  it('refuses more rows than a table holds, counted before the CSV is parsed', () => {
    const text = sparse(tableLimits.rows + 1, { dopings: 20, temperatures: 20 });
    expect(refusal(`# comment lines and blank lines are not rows\n\n${text}\n\n`).breach).toEqual(expect.objectContaining({ limit: 'rows', found: tableLimits.rows + 1 }));
    expect(() => parseTableCsv(sparse(tableLimits.rows, { dopings: 100, temperatures: 200 }))).not.toThrow();
  });

  it('counts the holes of a sparse grid under the caps, names the first few and leaves the large grid undrawn', () => {
    const p = parseTableCsv(sparse(tableLimits.dopings));
    const cells = tableLimits.dopings * tableLimits.dopings;
    expect(p.coverage).toMatchObject({ measured: tableLimits.dopings, holes: cells - tableLimits.dopings, present: null });
    expect(p.coverage.firstHoles).toHaveLength(5);
    expect(p.coverage.firstHoles[0]!.perCm3).toBe(p.coverage.dopings[0]);
    expect(p.coverage.firstHoles[0]!.temperature).toBe(p.coverage.temperatures[1]);
    expect(p.errors[0]!.message).toMatch(new RegExp(`the grid has ${cells - tableLimits.dopings} hole`));
  });

  it('lists at most a hundred errors of a broken file and says how many more there are', () => {
    const text = sparse(400, { dopings: 20, temperatures: 20 }).replace(/,1\.5$/gm, ',abc');
    const p = parseTableCsv(text);
    expect(p.errors).toHaveLength(issuesListed + 1);
    expect(p.errors[issuesListed]!.message).toMatch(/^300 more errors not listed/);
  });
});
