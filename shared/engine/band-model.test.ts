import { bandFamily, type BandParameters } from './band-model';
import { BOLTZMANN, ELECTRON_MASS, ELEMENTARY_CHARGE, K_OVER_E, PLANCK } from './constants';
import { propertiesAt, ztOptimalDoping } from './family-helpers';
import type { Properties } from './material-family';

const params: BandParameters = {
  carrier: 'p',
  effectiveMass: 1,
  mobility300: 350,
  mobilityExponent: -1.5,
  latticeKappa300: 1,
  latticeKappaExponent: -1,
};
const at = (p: BandParameters, perCm3: number, temperature: number): Properties => {
  const out = { seebeck: 0, sigma: 0, kappa: 0 };
  bandFamily(p).properties(Math.log10(perCm3), temperature, out);
  return out;
};
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const K_E2 = K_OVER_E * K_OVER_E;

describe('single parabolic band, acoustic-phonon scattering', () => {
  test('Lorenz number tends to 2(k/e)² ≈ 1.485e-8 W·Ω/K² non-degenerate and π²/3·(k/e)² ≈ 2.443e-8 degenerate', () => {
    // Limits for energy-independent mean free path (r = −½): e.g. G. S. Nolas,
    // J. Sharp, H. J. Goldsmid, Thermoelectrics (Springer 2001), ch. 2; the
    // degenerate value is the Sommerfeld value L0 = 2.44e-8 W·Ω/K² of
    // Ashcroft & Mermin, Solid State Physics (1976), ch. 2 (from memory).
    const lorenz = (p: Properties, t: number, latticeKappa: number) => (p.kappa - latticeKappa) / (p.sigma * t);
    const dilute = at(params, 1e14, 300);
    expect(relative(lorenz(dilute, 300, 1), 2 * K_E2)).toBeLessThan(1e-5);
    expect(2 * K_E2).toBeCloseTo(1.4853e-8, 11);
    const metallic = at({ ...params, effectiveMass: 0.05 }, 1e22, 300);
    expect(relative(lorenz(metallic, 300, 1), ((Math.PI * Math.PI) / 3) * K_E2)).toBeLessThan(1e-4);
    expect(((Math.PI * Math.PI) / 3) * K_E2).toBeCloseTo(2.443e-8, 11);
  });

  test('non-degenerate Seebeck S = (k/e)(2 − η) with η = ln(n/Nc), Nc(300 K, m* = 1) ≈ 2.51e19 cm⁻³', () => {
    // Nc = 2(2πm*kT/h²)^{3/2} = 2.5e19·(m*/m0)^{3/2} cm⁻³ at 300 K: S. M. Sze,
    // Physics of Semiconductor Devices, 2nd ed. (1981), ch. 1 (from memory).
    const nc = 2 * Math.pow((2 * Math.PI * ELECTRON_MASS * BOLTZMANN * 300) / (PLANCK * PLANCK), 1.5) * 1e-6;
    expect(nc / 1e19).toBeCloseTo(2.51, 2);
    const s = at(params, nc * Math.exp(-10), 300).seebeck;
    expect(relative(s, K_OVER_E * 12)).toBeLessThan(1e-4);
  });

  test('σ = n·e·μ0 in the non-degenerate limit (units: cm⁻³, cm²/(V·s) → SI)', () => {
    const p = at(params, 1e14, 300);
    expect(relative(p.sigma, 1e20 * ELEMENTARY_CHARGE * 350e-4)).toBeLessThan(1e-5);
    // μ0 ∝ T^−1.5 and κL ∝ T^−1 by the power laws.
    const cold = at(params, 1e14, 150);
    expect(relative(cold.sigma / p.sigma, Math.pow(0.5, -1.5))).toBeLessThan(1e-4);
    expect(relative(cold.kappa, 2)).toBeLessThan(1e-5);
  });

  test('degenerate mobility falls as (3√π/4)/√η and S → π²/(3η)·(k/e)', () => {
    const p = { ...params, effectiveMass: 0.05 };
    const out = at(p, 1e22, 300);
    // Reduced Fermi level from n = (2/3)η^{3/2}·N(T) to leading order.
    const N = 4 * Math.PI * Math.pow((2 * 0.05 * ELECTRON_MASS * BOLTZMANN * 300) / (PLANCK * PLANCK), 1.5);
    const eta = Math.pow(1.5 * (1e28 / N), 2 / 3);
    expect(relative(out.seebeck, (K_OVER_E * Math.PI * Math.PI) / (3 * eta))).toBeLessThan(1e-3);
    const mobility = out.sigma / (1e28 * ELEMENTARY_CHARGE * 350e-4);
    expect(relative(mobility, (3 * Math.sqrt(Math.PI)) / 4 / Math.sqrt(eta))).toBeLessThan(1e-3);
  });

  test('n-type is the mirror image: S changes sign, σ and κ do not', () => {
    const p = at(params, 3e19, 250);
    const n = at({ ...params, carrier: 'n' }, 3e19, 250);
    expect(n.seebeck).toBe(-p.seebeck);
    expect(n.sigma).toBe(p.sigma);
    expect(n.kappa).toBe(p.kappa);
    expect(bandFamily({ ...params, carrier: 'n' }).sign).toBe(-1);
  });

  test('zT has one interior maximum in doping, near 1e19 cm⁻³ at 300 K', () => {
    // Rule of thumb of the trade (G. J. Snyder and E. S. Toberer, "Complex
    // thermoelectric materials", Nature Materials 7, 105 (2008), from memory):
    // the best thermoelectrics are heavily doped semiconductors with
    // 1e19–1e21 carriers per cm³, the zT optimum sitting near η ≈ 0 for
    // acoustic-phonon scattering and a light band. With m* = 1 at 300 K that
    // is ~3e18–3e19 cm⁻³.
    const best = ztOptimalDoping(bandFamily(params), 300, 1e16, 1e22);
    expect(best).toBeGreaterThan(3e18);
    expect(best).toBeLessThan(3e19);
    const zt = (n: number) => propertiesAt(bandFamily(params), n, 300).zT;
    expect(zt(best)).toBeGreaterThan(zt(best * 1.1));
    expect(zt(best)).toBeGreaterThan(zt(best / 1.1));
    // Reduced Fermi level at the optimum: within a few kT of the band edge.
    const eta = Math.log(best / 2.51e19);
    expect(Math.abs(eta)).toBeLessThan(2);
  });
});
