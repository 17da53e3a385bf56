import { CaseError } from './case-error';
import { parseCoupleCase } from './couple-case';

const band = (carrier: 'p' | 'n') => ({ kind: 'band', carrier, effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 });
const bounds = { minPerCm3: 1e18, maxPerCm3: 1e20 };
const base = () => ({
  hotSide: 300,
  p: { length: 1e-3, area: 1e-6, material: band('p'), bounds },
  n: { length: 1e-3, material: band('n'), doping: 2e19 } as Record<string, unknown>,
});

function fieldOf(json: unknown): string {
  try {
    parseCoupleCase(json);
  } catch (e) {
    if (e instanceof CaseError) return e.message; // `field: message`
    throw e;
  }
  return 'accepted';
}

describe('parseCoupleCase', () => {
  test('defaults: maxDeltaT at no load; a leg with bounds is optimised, one without is fixed; the free ratio keeps p.area + n.area', () => {
    const c = parseCoupleCase(base());
    expect(c.objective).toBe('maxDeltaT');
    expect(c.heatLoad).toBe(0);
    expect(c.p.profile).toEqual(expect.objectContaining({ lower: 18, upper: 20, controlPoints: 6, monotone: false }));
    expect(c.n.profile).toBeUndefined();
    expect(c.areaRatio).toBeUndefined();
    expect(c.n.area).toBe(1e-6);
  });

  test('a given areaRatio sets n.area = areaRatio·p.area; the couple contact resistivity reaches both legs unless a leg has its own', () => {
    const c = parseCoupleCase({ ...base(), areaRatio: 1.5, contactResistivity: 5e-10, n: { ...base().n, contactResistivity: 1e-9 } });
    expect(c.areaRatio).toBe(1.5);
    expect(c.n.area).toBeCloseTo(1.5e-6, 18);
    expect(c.p.ends?.contacts).toEqual({ cold: 5e-10, hot: 5e-10 });
    expect(c.n.ends?.contacts).toEqual({ cold: 1e-9, hot: 1e-9 });
  });

  test.each<[string, Record<string, unknown>, RegExp]>([
    ['both areaRatio and n.area', { areaRatio: 1.2, n: { ...base().n, area: 1e-6 } }, /^areaRatio: give either areaRatio or n\.area/],
    ['bounds reversed', { p: { ...base().p, bounds: { minPerCm3: 1e20, maxPerCm3: 1e18 } } }, /^p\.bounds\.maxPerCm3: /],
    ['bounds in m⁻³', { p: { ...base().p, bounds: { minPerCm3: 1e18, maxPerCm3: 1e26 } } }, /^p\.bounds\.maxPerCm3: .*cm⁻³/],
    ['controlPoints on a fixed leg', { n: { ...base().n, controlPoints: 4 } }, /^n\.controlPoints: .*n\.bounds/],
    ['a fixed band leg without doping', { n: { length: 1e-3, material: band('n') } }, /^n\.doping: /],
    ['an n leg that is p-type', { n: { length: 1e-3, material: band('p'), doping: 1e19 } }, /^n\.material: .*n-type/],
    ['p without area', { p: { length: 1e-3, material: band('p'), bounds } }, /^p\.area: /],
    ['coldSide for maxDeltaT', { coldSide: 250 }, /^coldSide: .*maxHeatLoad and maxCop/],
    ['maxCop without a heat load', { objective: 'maxCop', coldSide: 270 }, /^heatLoad: maxCop needs a heat load/],
    ['maxCop with a current', { objective: 'maxCop', coldSide: 270, heatLoad: 0.01, current: 2 }, /^current: /],
    ['heatLoad for maxHeatLoad', { objective: 'maxHeatLoad', coldSide: 270, heatLoad: 0.01 }, /^heatLoad: /],
    ['coldSide above hotSide', { objective: 'maxHeatLoad', coldSide: 310 }, /^coldSide: must be below hotSide/],
    ['a misspelt field', { areaRatioo: 1 }, /^areaRatioo: unknown field/],
    ['a leg missing', { n: undefined }, /^n: n is required/],
    ['starts is the queue’s, not the case’s', { starts: 4 }, /^starts: unknown field/],
  ])('%s: a CaseError naming the field', (_name, change, pattern) => {
    expect(fieldOf({ ...base(), ...change })).toMatch(pattern);
  });
});
