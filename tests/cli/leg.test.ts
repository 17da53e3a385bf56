import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/**
 * The command-line contract: `npm run -s leg -- solve|optimize|curves|module|couple|cascade FILE` prints
 * one JSON object on stdout; invalid input exits 2 with one line on stderr
 * naming the field and nothing on stdout.
 */
const root = join(__dirname, '..', '..');
const tsx = join(root, 'node_modules', '.bin', 'tsx');
const dir = mkdtempSync(join(tmpdir(), 'frostgrade-leg-'));

type Run = { status: number | null; stdout: string; stderr: string };

function leg(args: string[]): Run {
  const r = spawnSync(tsx, [join(root, 'worker', 'cli', 'leg.ts'), ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

function caseFile(name: string, json: unknown): string {
  const file = join(dir, `${name}.json`);
  writeFileSync(file, typeof json === 'string' ? json : JSON.stringify(json));
  return file;
}

// Ioffe's worked example (A. F. Ioffe, Semiconductor Thermoelements and
// Thermoelectric Cooling, 1957): S = 200 µV/K, σ = 1e5 S/m, κ = 1.5 W/(m·K),
// Th = 300 K → ΔTmax = 70.3307 K.
const uniform = { hotSide: 300, length: 1e-3, area: 1e-6, segments: [{ fraction: 1, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 }] };
const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 };

describe('leg CLI', () => {
  test('solve prints the contract fields for the bundled example', () => {
    const r = leg(['solve', join(root, 'shared', 'engine', 'examples', 'detector-leg-solve.json')]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const field of ['coldSide', 'hotSide', 'deltaT', 'current', 'voltage', 'power', 'heatLoad', 'heatRejected', 'cop', 'profile']) expect(out).toHaveProperty(field);
    for (const field of ['x', 'temperature', 'seebeck', 'sigma', 'kappa', 'zT', 'perCm3']) expect(Array.isArray(out.profile[field])).toBe(true);
    expect(out.profile.x[0]).toBe(0);
    expect(out.profile.x[out.profile.x.length - 1]).toBeCloseTo(0.0012, 15);
    expect(out.profile.temperature[out.profile.temperature.length - 1]).toBeCloseTo(300, 6);
    expect(out.power).toBeCloseTo(out.voltage * out.current, 10);
    expect(out.deltaT).toBeCloseTo(out.hotSide - out.coldSide, 12);
  });

  test('runs through the documented npm script', () => {
    const r = spawnSync('npm', ['run', '-s', 'leg', '--', 'solve', caseFile('npm', { ...uniform, current: 4 })], { cwd: root, encoding: 'utf8', timeout: 120_000 });
    expect(r.status).toBe(0);
    // Ioffe's balance: Tc = (½I²R + K·Th)/(S·I + K) with R = 0.01 Ω, K = 1.5e-3 W/K.
    expect(JSON.parse(r.stdout).coldSide).toBeCloseTo((0.5 * 16 * 0.01 + 1.5e-3 * 300) / (2e-4 * 4 + 1.5e-3), 9);
  });

  test('optimize of a uniform constant leg reproduces Ioffe’s ΔTmax = 70.3307 K', () => {
    const r = leg(['optimize', caseFile('ioffe', uniform)]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.deltaT).toBeCloseTo(70.3307, 4);
    expect(typeof out.evaluations).toBe('number');
    expect(typeof out.seconds).toBe('number');
  });

  test('optimize of a band family adds doping, baselines, sensitivity, evaluations and seconds', () => {
    const r = leg(['optimize', caseFile('band', { hotSide: 300, length: 1e-3, area: 1e-6, material: band, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 4 })]);
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.doping.x).toEqual([0, 1 / 3, 2 / 3, 1]);
    expect(out.doping.perCm3).toHaveLength(4);
    expect(out.baselines.uniform).toEqual(expect.objectContaining({ perCm3: expect.any(Number), current: expect.any(Number), deltaT: expect.any(Number) }));
    expect(out.baselines.localBestZt).toEqual(expect.objectContaining({ current: expect.any(Number), deltaT: expect.any(Number), doping: expect.any(Object) }));
    expect(out.sensitivity).toHaveLength(4);
    expect(out.deltaT).toBeGreaterThan(out.baselines.uniform.deltaT);
    expect(out.profile.perCm3).toBeDefined();
  });

  test('a band material with a minority band: bipolar conduction lowers S at a lightly doped, hot leg; the same case without it is unchanged', () => {
    const minority = { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 };
    const leg1 = { hotSide: 300, length: 1e-3, area: 1e-6, current: 2, doping: 2e18 };
    const one = leg(['solve', caseFile('one-band', { ...leg1, material: band })]);
    const two = leg(['solve', caseFile('two-band', { ...leg1, material: { ...band, minority } })]);
    expect(two.stderr).toBe('');
    expect(two.status).toBe(0);
    const a = JSON.parse(one.stdout);
    const b = JSON.parse(two.stdout);
    const hot = (o: { profile: { seebeck: number[] } }) => o.profile.seebeck[o.profile.seebeck.length - 1];
    // Goldsmid, Introduction to Thermoelectricity (2010), bipolar chapter: minority carriers subtract from S.
    expect(hot(b)).toBeLessThan(hot(a));
    expect(b.deltaT).toBeLessThan(a.deltaT);
    const wide = leg(['solve', caseFile('wide-gap', { ...leg1, material: { ...band, minority: { ...minority, bandGap: 8, bandGapSlope: 0 } } })]);
    expect(JSON.parse(wide.stdout).coldSide).toBe(a.coldSide);
  });

  test('curves prints the curves, the pumping range and the marked currents for the bundled example', () => {
    const r = leg(['curves', join(root, 'shared', 'engine', 'examples', 'detector-leg-curves.json')]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const field of ['currents', 'heatLoad', 'heatRejected', 'voltage', 'power', 'cop', 'overLimit']) expect(out[field]).toHaveLength(40);
    expect(out.deltaT).toBe(40);
    expect(out.currentLimit).toBe(5);
    const [lo, hi] = out.pumpingRange;
    expect(out.currents[0]).toBe(lo);
    expect(out.currents[39]).toBe(hi);
    expect(out.maxCop.current).toBeLessThan(out.maxHeatLoad.current);
    expect(out.maxHeatLoad.heatLoad).toBeGreaterThan(Math.max(...out.heatLoad) - 1e-12);
    out.currents.forEach((I: number, k: number) => expect(out.overLimit[k]).toBe(I > 5));
    expect(out.power[10]).toBeCloseTo(out.voltage[10] * out.currents[10], 12);
    expect(typeof out.seconds).toBe('number');
  });

  test('module prints the module, its curves versus current and ΔT, and the N-couple trade', () => {
    const r = leg(['module', join(root, 'shared', 'engine', 'examples', 'detector-module.json')]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.module).toEqual(expect.objectContaining({ couples: 31, areaRatio: expect.any(Number), totalLegArea: expect.any(Number) }));
    expect(out.versusCurrent.currents).toHaveLength(40);
    expect(out.versusCurrent.coldJunction).toHaveLength(40);
    expect(out.versusDeltaT.mode).toBe('maxHeatLoadCurrent');
    expect(out.versusDeltaT.deltaT).toHaveLength(21);
    expect(out.versusDeltaT.deltaT[20]).toBeCloseTo(out.versusDeltaT.hotSide - out.versusDeltaT.deltaTMax.coldSide, 9);
    const n31 = out.trade.rows.find((row: { couples: number }) => row.couples === 31);
    expect(n31.maxHeatLoad.current).toBeCloseTo(out.versusCurrent.maxHeatLoad.current, 9);
    // Fewer couples from the same leg area need more current than the 5 A supply gives.
    expect(out.trade.rows[0].couples).toBe(1);
    expect(out.trade.rows[0].maxHeatLoad.overLimit).toBe(true);
  });

  test('cascade prints the stages coldest first, the totals and the curves with one stage fewer', () => {
    const stage = (couples: number, interfaceResistance: number) => ({ couples, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, area: 1e-6, segments: [{ ...uniform.segments[0], seebeck: -2e-4 }] }, interfaceResistance });
    const r = leg(['cascade', caseFile('cascade', { hotSide: 300, heatLoad: 0.01, wiring: 'separate', currents: [3, null], stages: [stage(2, 0.2), stage(10, 0.05)], curvePoints: 4 })]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const field of ['hotSide', 'coldSide', 'deltaT', 'heatLoad', 'objective', 'wiring', 'stages', 'power', 'cop', 'curves', 'evaluations', 'seconds']) expect(out).toHaveProperty(field);
    expect(out.stages).toHaveLength(2);
    expect(out.stages[0].current).toBe(3);
    expect(out.stages[0].coldSide).toBe(out.coldSide);
    // The heat a stage rejects is the next stage's load; the total power is the stages' sum.
    expect(out.stages[1].heatLoad).toBeCloseTo(out.stages[0].heatRejected, 9);
    expect(out.power).toBeCloseTo(out.stages[0].power + out.stages[1].power, 12);
    expect(out.curves.map((c: { stages: number }) => c.stages)).toEqual([2, 1]);
    expect(out.curves[0].points).toHaveLength(4);
  });

  test('couple optimises both graded legs, the ratio and the current of the bundled detector example', () => {
    const r = leg(['couple', join(root, 'shared', 'engine', 'examples', 'detector-couple.json')]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    for (const field of ['hotSide', 'coldSide', 'deltaT', 'heatLoad', 'current', 'voltage', 'power', 'cop', 'areaRatio', 'objective', 'p', 'n', 'mismatch', 'evaluations', 'seconds']) expect(out).toHaveProperty(field);
    expect(out.objective.kind).toBe('maxDeltaT');
    expect(out.heatLoad).toBeCloseTo(0.002, 9);
    expect(out.deltaT).toBeCloseTo(out.hotSide - out.coldSide, 9);
    // The free ratio splits the case's 2 mm² of legs.
    expect(out.p.area + out.n.area).toBeCloseTo(2e-6, 15);
    expect(out.areaRatio).toBeCloseTo(out.n.area / out.p.area, 9);
    for (const side of ['p', 'n']) {
      expect(out[side].optimised).toBe(true);
      expect(out[side].doping.perCm3).toHaveLength(5);
      expect(out[side].leg).toEqual(expect.objectContaining({ length: 0.0012, area: out[side].area, contactResistivity: 5e-10 }));
    }
    // Monotone p leg: its doping never rises along the leg or never falls.
    const d = out.p.doping.perCm3 as number[];
    const steps = d.slice(1).map((v, k) => Math.sign(v - d[k]));
    expect(steps.every((s) => s <= 0) || steps.every((s) => s >= 0)).toBe(true);
    expect(out.mismatch.unit).toBe('K');
    expect(out.mismatch.cost).toBeGreaterThanOrEqual(0);
  });

  test.each<[string, string[] | (() => string[]), RegExp]>([
    ['unknown command', ['frobnicate', 'x.json'], /^command: /],
    ['missing file argument', ['solve'], /^FILE: /],
    ['unreadable file', ['solve', '/nonexistent/case.json'], /^FILE: cannot read/],
    ['invalid JSON', () => ['solve', caseFile('broken', '{"hotSide": 300,')], /^\(case\): .*not valid JSON/],
    ['doping in m⁻³', () => ['solve', caseFile('m3', { ...uniform, segments: undefined, material: band, doping: 1e25, current: 3 })], /^doping: .*cm⁻³/],
    ['doping node out of range', () => ['solve', caseFile('node', { ...uniform, segments: undefined, material: band, doping: { x: [0, 1], perCm3: [1e19, 1e10] }, current: 3 })], /^doping\.perCm3\[1\]: /],
    ['segment fraction', () => ['solve', caseFile('frac', { ...uniform, current: 3, segments: [{ ...uniform.segments[0], fraction: 0.5 }, { ...uniform.segments[0], fraction: -0.5 }] })], /^segments\[1\]\.fraction: /],
    ['band effective mass', () => ['solve', caseFile('mass', { ...uniform, segments: undefined, material: { ...band, effectiveMass: -1 }, doping: 1e19, current: 3 })], /^material\.effectiveMass: /],
    ['minority band gap in meV', () => ['solve', caseFile('gap', { ...uniform, segments: undefined, material: { ...band, minority: { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 170, bandGapSlope: 1e-4 } }, doping: 1e19, current: 3 })], /^material\.minority\.bandGap: .*meV/],
    ['minority band without its slope', () => ['solve', caseFile('slope', { ...uniform, segments: undefined, material: { ...band, minority: { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2 } }, doping: 1e19, current: 3 })], /^material\.minority\.bandGapSlope: bandGapSlope is required/],
    ['NaN written as a string', () => ['solve', caseFile('nan', { ...uniform, current: 'NaN' })], /^current: /],
    ['current missing for solve', () => ['solve', caseFile('nocurrent', uniform)], /^current: is required/],
    ['bounds missing for a band optimisation', () => ['optimize', caseFile('nobounds', { ...uniform, segments: undefined, material: band })], /^bounds: /],
    ['curves: both deltaT and coldSide', () => ['curves', caseFile('both', { ...uniform, deltaT: 20, coldSide: 280 })], /^deltaT: /],
    ['curves: a ΔT beyond the leg’s ΔTmax', () => ['curves', caseFile('toofar', { ...uniform, deltaT: 75 })], /^deltaT: .*cannot hold ΔT = 75 K/],
    ['curves: contact resistivity in Ω·cm²', () => ['curves', caseFile('rc', { ...uniform, deltaT: 20, contactResistivity: 1e-5 })], /^contactResistivity: /],
    [
      'module: an n leg that is p-type',
      () => ['module', caseFile('nn', { hotSide: 300, deltaT: 20, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, area: 1e-6, segments: uniform.segments } })],
      /^n\.segments: /,
    ],
    ['module: no legs', () => ['module', caseFile('nolegs', { hotSide: 300, deltaT: 20 })], /^p: /],
    [
      'cascade: a stage with zero couples',
      () => ['cascade', caseFile('zero', { hotSide: 300, stages: [{ couples: 0, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, area: 1e-6, segments: [{ ...uniform.segments[0], seebeck: -2e-4 }] } }] })],
      /^stages\[0\]\.couples: a stage needs at least 1 couple/,
    ],
    [
      'cascade: interface resistance negative',
      () => ['cascade', caseFile('negative', { hotSide: 300, stages: [{ couples: 1, interfaceResistance: -1, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, area: 1e-6, segments: [{ ...uniform.segments[0], seebeck: -2e-4 }] } }] })],
      /^stages\[0\]\.interfaceResistance: /,
    ],
    [
      'couple: bounds reversed on the n leg',
      () => ['couple', caseFile('cbounds', { hotSide: 300, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, material: { ...band, carrier: 'n' }, bounds: { minPerCm3: 1e20, maxPerCm3: 1e18 } } })],
      /^n\.bounds\.maxPerCm3: /,
    ],
    ['couple: both areaRatio and n.area', () => ['couple', caseFile('cratio', { hotSide: 300, areaRatio: 1.2, p: { length: 1e-3, area: 1e-6, segments: uniform.segments }, n: { length: 1e-3, area: 1e-6, segments: [{ ...uniform.segments[0], seebeck: -2e-4 }] } })], /^areaRatio: /],
  ])('bad input (%s): exit 2, one line naming the field on stderr, nothing on stdout', (_name, args, pattern) => {
    const r = leg(typeof args === 'function' ? args() : args);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.split('\n').filter((l) => l.length > 0);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(pattern);
  });
});
