import { familyFromMaterial, type MaterialInput } from '@/shared/engine';
import { bipolarOnset, minorityShareVsDoping } from './bipolar-curves';

const band = { kind: 'band', carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const twoBand: MaterialInput = { ...band, minority: { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 } };
const range = { min: 1e17, max: 1e21 };

describe('where bipolar conduction sets in', () => {
  it('finds the doping where minority carriers carry 5 % of the current, rising with temperature', () => {
    const family = familyFromMaterial(twoBand);
    const at300 = bipolarOnset(family, 300, range);
    const at400 = bipolarOnset(family, 400, range);
    expect(at300?.kind).toBe('below');
    expect(at400?.kind).toBe('below');
    if (at300?.kind !== 'below' || at400?.kind !== 'below') return;
    // A gap of 0.17 eV at 300 K: bipolar below a few 1e18 cm⁻³ (the engine's optimum stops at 5.3e18 with 4.6 %).
    expect(at300.perCm3).toBeGreaterThan(1e18);
    expect(at300.perCm3).toBeLessThan(5.3e18);
    expect(family.minorityShare?.(Math.log10(at300.perCm3), 300)).toBeCloseTo(0.05, 3);
    expect(at400.perCm3).toBeGreaterThan(at300.perCm3);
    expect(bipolarOnset(family, 200, { min: 1e18, max: 1e21 })).toEqual({ kind: 'nowhere' });
  });

  it('plots the share in % falling with doping, and nothing for a one-band family', () => {
    const line = minorityShareVsDoping(familyFromMaterial(twoBand), 300, range);
    expect(line.length).toBeGreaterThan(10);
    for (let i = 1; i < line.length; i++) expect(line[i].y).toBeLessThan(line[i - 1].y);
    expect(line[0].y).toBeGreaterThan(5);
    expect(minorityShareVsDoping(familyFromMaterial(band), 300, range)).toEqual([]);
    expect(bipolarOnset(familyFromMaterial(band), 300, range)).toBeNull();
  });
});
