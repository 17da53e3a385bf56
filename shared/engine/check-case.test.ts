import { CaseError } from './case-error';
import { parseCase, type Mode } from './check-case';
import { optimizeLeg, solveLeg } from './run-case';

const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 };
const solveCase = { hotSide: 300, length: 1e-3, area: 1e-6, current: 3, material: band, doping: 1e19 };
const optimizeCase = { hotSide: 300, length: 1e-3, area: 1e-6, material: band, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 } };
const segments = [
  { fraction: 0.6, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 },
  { fraction: 0.4, seebeck: 2.2e-4, sigma: 0.8e5, kappa: 1.4 },
];
const grid = (skip?: [number, number]) => {
  const rows = [];
  for (const perCm3 of [1e18, 1e19, 1e20]) {
    for (const temperature of [250, 300, 350]) {
      if (skip && skip[0] === perCm3 && skip[1] === temperature) continue;
      rows.push({ perCm3, temperature, seebeck: 2e-4, sigma: 1e5, kappa: 1.5 });
    }
  }
  return rows;
};

const fieldOf = (json: unknown, mode: Mode): string => {
  try {
    parseCase(json, mode);
  } catch (e) {
    if (e instanceof CaseError) return e.field;
    throw e;
  }
  return '(accepted)';
};

describe('parseCase names the offending field', () => {
  test.each<[string, unknown, Mode, string]>([
    ['not an object', [1, 2], 'solve', '(case)'],
    ['missing hotSide', { ...solveCase, hotSide: undefined }, 'solve', 'hotSide'],
    ['NaN temperature', { ...solveCase, hotSide: NaN }, 'solve', 'hotSide'],
    ['infinite length', { ...solveCase, length: Infinity }, 'solve', 'length'],
    ['zero length', { ...solveCase, length: 0 }, 'solve', 'length'],
    ['length in mm', { ...solveCase, length: 1.2 }, 'solve', 'length'],
    ['negative area', { ...solveCase, area: -1e-6 }, 'solve', 'area'],
    ['negative temperature', { ...solveCase, hotSide: -5 }, 'solve', 'hotSide'],
    ['unknown field', { ...solveCase, hotside: 300 }, 'solve', 'hotside'],
    ['band effective mass', { ...solveCase, material: { ...band, effectiveMass: 0 } }, 'solve', 'material.effectiveMass'],
    ['band carrier', { ...solveCase, material: { ...band, carrier: 'x' } }, 'solve', 'material.carrier'],
    ['unknown material kind', { ...solveCase, material: { kind: 'magic' } }, 'solve', 'material.kind'],
    ['doping in m⁻³ (10⁶ too large)', { ...solveCase, doping: 1e25 }, 'solve', 'doping'],
    ['doping node out of range', { ...solveCase, doping: { x: [0, 0.5, 1], perCm3: [1e19, 2e19, 1e26] } }, 'solve', 'doping.perCm3[2]'],
    ['doping nodes not increasing', { ...solveCase, doping: { x: [0, 0.6, 0.5, 1], perCm3: [1e19, 1e19, 1e19, 1e19] } }, 'solve', 'doping.x[2]'],
    ['doping nodes not reaching the hot end', { ...solveCase, doping: { x: [0, 0.9], perCm3: [1e19, 1e19] } }, 'solve', 'doping.x[1]'],
    ['doping lists of different lengths', { ...solveCase, doping: { x: [0, 1], perCm3: [1e19] } }, 'solve', 'doping.perCm3'],
    ['segment fraction zero', { ...solveCase, material: undefined, doping: undefined, segments: [{ ...segments[0], fraction: 0 }, segments[1]] }, 'solve', 'segments[0].fraction'],
    ['fractions not summing to 1', { ...solveCase, material: undefined, doping: undefined, segments: [segments[0], { ...segments[1], fraction: 0.3 }] }, 'solve', 'segments'],
    ['Seebeck in µV/K', { ...solveCase, material: undefined, doping: undefined, segments: [{ ...segments[0], seebeck: 200 }, segments[1]] }, 'solve', 'segments[0].seebeck'],
    ['mixed carrier types', { ...solveCase, material: undefined, doping: undefined, segments: [segments[0], { ...segments[1], seebeck: -2e-4 }] }, 'solve', 'segments[1].seebeck'],
    ['both segments and material', { ...solveCase, segments }, 'solve', 'segments'],
    ['neither segments nor material', { ...solveCase, material: undefined }, 'solve', 'material'],
    ['solve without a current', { ...solveCase, current: undefined }, 'solve', 'current'],
    ['solve with both end conditions', { ...solveCase, heatLoad: 0.1, coldSide: 250 }, 'solve', 'coldSide'],
    ['negative current', { ...solveCase, current: -1 }, 'solve', 'current'],
    ['solve of a family without doping', { ...solveCase, doping: undefined }, 'solve', 'doping'],
    ['band optimise without bounds', { ...optimizeCase, bounds: undefined }, 'optimize', 'bounds'],
    ['bounds reversed', { ...optimizeCase, bounds: { minPerCm3: 1e20, maxPerCm3: 1e18 } }, 'optimize', 'bounds.maxPerCm3'],
    ['too many control points', { ...optimizeCase, controlPoints: 100 }, 'optimize', 'controlPoints'],
    ['fractional control points', { ...optimizeCase, controlPoints: 5.5 }, 'optimize', 'controlPoints'],
    ['unknown objective', { ...optimizeCase, objective: 'maxFun' }, 'optimize', 'objective'],
    ['maxHeatLoad without coldSide', { ...optimizeCase, objective: 'maxHeatLoad' }, 'optimize', 'coldSide'],
    ['maxHeatLoad given a heat load', { ...optimizeCase, objective: 'maxHeatLoad', coldSide: 270, heatLoad: 0.1 }, 'optimize', 'heatLoad'],
    ['maxCop without a heat load', { ...optimizeCase, objective: 'maxCop', coldSide: 270 }, 'optimize', 'heatLoad'],
    ['maxCop with a fixed current', { ...optimizeCase, objective: 'maxCop', coldSide: 270, heatLoad: 0.1, current: 2 }, 'optimize', 'current'],
    ['maxDeltaT given a cold side', { ...optimizeCase, coldSide: 250 }, 'optimize', 'coldSide'],
    ['freeFractions with a material', { ...optimizeCase, freeFractions: true }, 'optimize', 'freeFractions'],
    ['doping with segments', { ...optimizeCase, material: undefined, bounds: undefined, segments, doping: 1e19 }, 'optimize', 'doping'],
    ['ragged table (a missing grid point)', { ...solveCase, material: { kind: 'table', rows: grid([1e19, 300]) } }, 'solve', 'material.rows'],
    ['duplicated table row', { ...solveCase, material: { kind: 'table', rows: [...grid(), grid()[4]] } }, 'solve', 'material.rows[9]'],
    ['table row doping in m⁻³', { ...solveCase, material: { kind: 'table', rows: grid().map((r, k) => (k === 3 ? { ...r, perCm3: 1e25 } : r)) } }, 'solve', 'material.rows[3].perCm3'],
    ['doping outside the table', { ...solveCase, material: { kind: 'table', rows: grid() }, doping: 5e20 }, 'solve', 'doping'],
    ['hot side outside the table', { ...solveCase, material: { kind: 'table', rows: grid() }, hotSide: 400 }, 'solve', 'hotSide'],
    ['bounds outside the table', { ...optimizeCase, material: { kind: 'table', rows: grid() }, bounds: { minPerCm3: 1e17, maxPerCm3: 1e19 } }, 'optimize', 'bounds.minPerCm3'],
  ])('%s → %s', (_name, json, mode, field) => {
    expect(fieldOf(json, mode)).toBe(field);
  });

  test('the ragged-grid message names the missing doping and temperature', () => {
    expect(() => parseCase({ ...solveCase, material: { kind: 'table', rows: grid([1e19, 300]) } }, 'solve')).toThrow(/perCm3 = 1e\+19 and temperature = 300 K/);
  });

  test('the out-of-table message names the doping and the table range', () => {
    expect(() => parseCase({ ...solveCase, material: { kind: 'table', rows: grid() }, doping: 5e20 }, 'solve')).toThrow(/5e\+20 cm⁻³ is outside the table's doping range 1.00e\+18–1.00e\+20/);
  });

  test('valid cases pass, with defaults applied', () => {
    const c = parseCase(optimizeCase, 'optimize');
    expect(c.objective).toBe('maxDeltaT');
    expect(c.heatLoad).toBe(0);
    expect(c.leg.kind === 'family' && c.leg.controlPoints).toBe(6);
    expect(c.leg.kind === 'family' && c.leg.monotone).toBe(false);
    const t = parseCase({ ...optimizeCase, material: { kind: 'table', rows: grid() }, bounds: undefined }, 'optimize');
    expect(t.leg.kind === 'family' && t.leg.bounds).toEqual({ lower: 18, upper: 20 });
    expect(fieldOf({ ...solveCase, material: undefined, doping: undefined, segments }, 'solve')).toBe('(accepted)');
    expect(fieldOf({ ...solveCase, heatLoad: undefined, coldSide: 260 }, 'solve')).toBe('(accepted)');
  });
});

describe('optimiser options are checked up front', () => {
  const fieldOfRun = (run: () => unknown): string => {
    try {
      run();
    } catch (e) {
      if (e instanceof CaseError) return e.field;
      throw e;
    }
    return '(accepted)';
  };
  test.each<[string, () => unknown, string]>([
    ['tolerance out of range', () => optimizeLeg(parseCase(optimizeCase), { tolerance: 0.5 }), 'tolerance'],
    ['checkpoint with the wrong number of nodes', () => optimizeLeg(parseCase(optimizeCase), { start: { kind: 'doping', perCm3: [1e19, 1e19], current: 3 } }), 'start.perCm3'],
    ['segment checkpoint for a doping run', () => optimizeLeg(parseCase(optimizeCase), { start: { kind: 'segments', fractions: [1], current: 3 } }), 'start'],
    ['profile points out of range', () => solveLeg(parseCase(solveCase, 'solve'), { profilePoints: 1 }), 'profilePoints'],
  ])('%s → %s', (_name, run, field) => {
    expect(fieldOfRun(run)).toBe(field);
  });
});
