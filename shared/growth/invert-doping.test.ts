import { bandFamily } from '../engine/band-model';
import { propertiesAt } from '../engine/family-helpers';
import { invertDoping } from './invert-doping';

const majority = { carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 } as const;
const twoBand = bandFamily({ ...majority, minority: { effectiveMass: 1, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 } });

describe('doping from a measurement in a two-band family', () => {
  test('S and σ turn over at low doping, so each reading has two dopings; the extrinsic one is returned', () => {
    // Bipolar conduction makes |S| peak and σ dip (faster minority electrons) near ni
    // (H. J. Goldsmid, Introduction to Thermoelectricity, 2010, bipolar chapter; from memory).
    const at = (n: number) => propertiesAt(twoBand, n, 300);
    expect(Math.abs(at(3e17).seebeck)).toBeLessThan(Math.abs(at(3e18).seebeck));
    expect(at(1e14).sigma).toBeGreaterThan(at(3e17).sigma);
    // |S| peaks near 6e18 cm⁻³ at 300 K here: above it S fixes the doping; σ does from its dip (~1e18) up.
    for (const n of [8e18, 1.5e19, 6e19]) {
      const est = invertDoping(twoBand, 300, { seebeck: at(n).seebeck }, 14, 22);
      expect(Math.abs(Math.log10(est.fromSeebeck!) - Math.log10(n))).toBeLessThan(1e-5);
      expect(est.outOfRange).toBe(false);
    }
    for (const n of [2.5e18, 5e18, 1.5e19, 6e19]) {
      const est = invertDoping(twoBand, 300, { sigma: at(n).sigma }, 14, 22);
      expect(Math.abs(Math.log10(est.fromSigma!) - Math.log10(n))).toBeLessThan(1e-5);
    }
  });

  test('a single-band family inverts as before', () => {
    const one = bandFamily(majority);
    const m = propertiesAt(one, 2e18, 300);
    const est = invertDoping(one, 300, { seebeck: m.seebeck, sigma: m.sigma }, 14, 22);
    expect(Math.abs(Math.log10(est.perCm3) - Math.log10(2e18))).toBeLessThan(1e-6);
  });
});
