import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { CaseError } from './case-error';
import { parseCase } from './check-case';
import { parseCurvesCase, parseLegDefinition, parseModuleCase } from './device-case';
import { operatingCurve } from './module';
import { optimizeLeg, solveLeg } from './run-case';
import { runCurves } from './run-device-case';
import { legsFromRun } from './run-legs';

const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 };
const bandN = { ...band, carrier: 'n' };
const leg = { length: 1.2e-3, area: 1e-6, material: band, doping: { x: [0, 0.5, 1], perCm3: [3e19, 1.5e19, 4e18] } };
const curves = { hotSide: 300, deltaT: 40, ...leg };
const moduleJson = { hotSide: 300, deltaT: 30, p: leg, n: { length: 1.2e-3, material: bandN, doping: 1.2e19 }, areaRatio: 1.2, couples: 31 };
const example = (name: string) => JSON.parse(readFileSync(join(__dirname, 'examples', name), 'utf8')) as Record<string, unknown>;

function fieldOf(f: () => unknown): string | undefined {
  try {
    f();
  } catch (e) {
    if (e instanceof CaseError) return e.field;
    throw e;
  }
  return undefined;
}

describe('curves and module cases', () => {
  test('the bundled examples parse', () => {
    const c = parseCurvesCase(example('detector-leg-curves.json'));
    expect(c.conditions).toEqual({ hotSide: 300, deltaT: 40 });
    expect(c.options).toEqual({ points: 40, currentLimit: 5 });
    expect(c.leg.ends).toEqual({ contacts: { cold: 5e-10, hot: 5e-10 } });
    const m = parseModuleCase(example('detector-module.json'));
    expect(m.module.couples).toBe(31);
    expect(m.module.n.area).toBeCloseTo(1.2e-6, 18);
    expect(m.areaRatio).toBeCloseTo(1.2, 12);
    expect(m.module.p.ends).toEqual({ contacts: { cold: 5e-10, hot: 5e-10 } });
    expect(m.module.n.ends).toEqual({ contacts: { cold: 5e-10, hot: 5e-10 } });
    expect(m.module.coldPlateResistance).toBe(0.08);
  });

  test('a leg reads the same as in a solve case: the curve at a current equals solveLeg there', () => {
    const c = parseCurvesCase({ ...curves, points: 3 });
    const curve = operatingCurve(c.leg, c.conditions, c.options);
    const s = solveLeg(parseCase({ ...leg, hotSide: 300, coldSide: 260, current: curve.currents[1] }, 'solve'));
    expect(Math.abs(s.heatLoad - curve.heatLoad[1]) / curve.maxHeatLoad.heatLoad).toBeLessThan(1e-9);
    expect(Math.abs(s.voltage - curve.voltage[1]) / curve.voltage[1]).toBeLessThan(1e-9);
    expect(runCurves(c).heatLoad).toEqual(curve.heatLoad);
    // A checked solve/optimize case is a leg definition as it stands.
    const fromCase = operatingCurve(parseCase({ ...leg, hotSide: 300, current: 1 }, 'solve'), c.conditions, c.options);
    expect(fromCase.heatLoad).toEqual(curve.heatLoad);
  });

  test.each<[string, string, unknown]>([
    ['both deltaT and coldSide', 'deltaT', { ...curves, coldSide: 260 }],
    ['neither deltaT nor coldSide', 'deltaT', { ...curves, deltaT: undefined }],
    ['a negative ΔT', 'deltaT', { ...curves, deltaT: -5 }],
    ['a cold side above the hot side', 'coldSide', { ...curves, deltaT: undefined, coldSide: 310 }],
    ['points too few', 'points', { ...curves, points: 1 }],
    ['a current limit of 0', 'currentLimit', { ...curves, currentLimit: 0 }],
    ['contact resistivity in Ω·cm²', 'contactResistivity', { ...curves, contactResistivity: 5e-6 }],
    ['a doping node in m⁻³', 'doping.perCm3[1]', { ...curves, doping: { x: [0, 1], perCm3: [1e19, 1e25] } }],
    ['a band material without doping', 'doping', { ...curves, doping: undefined }],
    ['an unknown field', 'heatload', { ...curves, heatload: 1 }],
    ['an optimiser field', 'controlPoints', { ...curves, controlPoints: 6 }],
  ])('curves: %s names %s', (_name, field, json) => {
    expect(fieldOf(() => parseCurvesCase(json))).toBe(field);
  });

  test.each<[string, string, unknown]>([
    ['the p leg’s area missing', 'p.area', { ...moduleJson, p: { ...leg, area: undefined } }],
    ['both areaRatio and n.area', 'areaRatio', { ...moduleJson, n: { ...moduleJson.n, area: 1e-6 } }],
    ['neither areaRatio nor n.area', 'n.area', { ...moduleJson, areaRatio: undefined }],
    ['a p-type n leg', 'n.material', { ...moduleJson, n: { ...moduleJson.n, material: band } }],
    ['an n-type p leg', 'p.material', { ...moduleJson, p: { ...leg, material: bandN } }],
    ['a fractional couple count', 'couples', { ...moduleJson, couples: 3.5 }],
    ['a negative plate resistance', 'hotPlateResistance', { ...moduleJson, hotPlateResistance: -0.1 }],
    ['a bad n doping', 'n.doping', { ...moduleJson, n: { ...moduleJson.n, doping: 1e10 } }],
    ['an unknown field inside a leg', 'p.dopng', { ...moduleJson, p: { ...leg, dopng: 1 } }],
    ['a trade list with a zero', 'tradeCouples[1]', { ...moduleJson, tradeCouples: [1, 0] }],
    ['a ΔT-curve current of 0', 'deltaTCurrent', { ...moduleJson, deltaTCurrent: 0 }],
    ['not an object', '(case)', [1, 2]],
  ])('module: %s names %s', (_name, field, json) => {
    expect(fieldOf(() => parseModuleCase(json))).toBe(field);
  });

  test('a per-leg contactResistivity overrides the module’s', () => {
    const m = parseModuleCase({ ...moduleJson, contactResistivity: 1e-9, p: { ...leg, contactResistivity: 2e-10 } });
    expect(m.module.p.ends?.contacts).toEqual({ cold: 2e-10, hot: 2e-10 });
    expect(m.module.n.ends?.contacts).toEqual({ cold: 1e-9, hot: 1e-9 });
  });

  test('parseLegDefinition names fields under its prefix', () => {
    expect(fieldOf(() => parseLegDefinition({ ...leg, length: -1 }, 300, 'p'))).toBe('p.length');
    expect(parseLegDefinition(leg, 300).area).toBe(1e-6);
  });
});

describe('legs of a stored run', () => {
  test('optimum and both baselines, each curve computed; the ΔT-optimised leg holds the run’s ΔT', () => {
    const runCase = { hotSide: 300, length: 1.2e-3, area: 1e-6, material: band, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 4, contactResistivity: 3e-10 };
    const result = optimizeLeg(parseCase(runCase));
    const legs = legsFromRun(runCase, result);
    expect(legs.optimum.doping).toEqual(result.doping);
    expect(legs.optimum.contactResistivity).toBe(3e-10);
    expect(legs.uniform?.doping).toBe((result.baselines as { uniform: { perCm3: number } }).uniform.perCm3);
    expect(legs.localBestZt?.doping).toEqual((result.baselines as { localBestZt: { doping: unknown } }).localBestZt.doping);
    // Just below the run's own ΔTmax each leg still pumps; the optimum pumps the most.
    const deltaT = result.deltaT - 15;
    const [opt, uni, loc] = [legs.optimum, legs.uniform, legs.localBestZt].map((l) => runCurves(parseCurvesCase({ ...l, hotSide: 300, deltaT, points: 5 })));
    expect(opt.maxHeatLoad.heatLoad).toBeGreaterThan(uni.maxHeatLoad.heatLoad);
    expect(opt.maxHeatLoad.heatLoad).toBeGreaterThan(loc.maxHeatLoad.heatLoad);
    // At the run's ΔTmax the optimum's pumping range shrinks to its optimal current.
    const edge = runCurves(parseCurvesCase({ ...legs.optimum, hotSide: 300, deltaT: result.deltaT - 0.01, points: 2 }));
    expect(Math.abs(edge.maxHeatLoad.current - result.current) / result.current).toBeLessThan(0.01);
  });

  test('a segmented run: the best single segment is the uniform baseline', () => {
    const segments = [
      { fraction: 0.6, seebeck: 150e-6, sigma: 1.5e5, kappa: 1.4 },
      { fraction: 0.4, seebeck: 230e-6, sigma: 0.8e5, kappa: 1.3 },
    ];
    const runCase = { hotSide: 300, length: 1e-3, area: 1e-6, segments, freeFractions: true };
    const result = optimizeLeg(parseCase(runCase));
    const legs = legsFromRun(runCase, result);
    expect(legs.optimum.segments).toEqual(result.segments);
    expect(legs.uniform?.segments).toHaveLength(1);
    expect(legs.localBestZt).toBeNull();
  });
});
