import { BOLTZMANN, ELECTRON_MASS, PLANCK } from './constants';
import { fermiIntegral } from './fermi-integrals';
import { hallCorrection, hallFactorAt } from './hall-factor';

/**
 * Hall factor of one parabolic band with acoustic-phonon scattering. Limits:
 * r_H = 3π/8 for non-degenerate carriers (E. H. Putley, The Hall Effect and
 * Related Phenomena, Butterworths 1960, ch. 4; K. Seeger, Semiconductor
 * Physics, Springer, the Hall-effect chapter — both from memory), and r_H → 1
 * for a degenerate band (the same sources: only carriers at the Fermi
 * surface conduct, so there is no average over energies to weight).
 */
describe('Hall factor', () => {
  it('is 3π/8 when non-degenerate and tends to 1 when degenerate', () => {
    expect(hallFactorAt(-25)).toBeCloseTo((3 * Math.PI) / 8, 9);
    expect(hallFactorAt(-8)).toBeCloseTo((3 * Math.PI) / 8, 3);
    // Sommerfeld: the first correction falls as 1/η² (from memory), so 1 to a few 1e-4 at η = 100.
    expect(Math.abs(hallFactorAt(100) - 1)).toBeLessThan(1e-3);
    expect(Math.abs(hallFactorAt(300) - 1)).toBeLessThan(Math.abs(hallFactorAt(100) - 1));
    // Between the limits it falls monotonically.
    const etas = [-10, -3, 0, 3, 10, 30];
    etas.slice(1).forEach((eta, i) => expect(hallFactorAt(eta)).toBeLessThan(hallFactorAt(etas[i]!)));
  });

  it('turns a Hall concentration into the carrier concentration whose own Fermi level gives that factor', () => {
    const m = 1;
    const T = 300;
    for (const hall of [1e16, 1e18, 1e19, 1e20, 1e21]) {
      const r = hallCorrection({ effectiveMass: m }, hall, T);
      // n = 4π(2m*kT/h²)^{3/2}·F½(η) (unnormalised F½) by direct quadrature at the η found: it is the corrected concentration.
      const n = 4 * Math.PI * Math.pow((2 * m * ELECTRON_MASS * BOLTZMANN * T) / (PLANCK * PLANCK), 1.5) * fermiIntegral(0.5, r.eta) * 1e-6;
      expect(Math.abs(Math.log10(n / r.perCm3))).toBeLessThan(1e-8);
      expect(r.factor).toBeCloseTo(hallFactorAt(r.eta), 12);
    }
    // The demo family (m* = 1) at 1e16 cm⁻³ is non-degenerate; at 1e21 strongly degenerate.
    expect(hallCorrection({ effectiveMass: 1 }, 1e16, 300).factor).toBeCloseTo((3 * Math.PI) / 8, 4);
    expect(hallCorrection({ effectiveMass: 1 }, 1e21, 300).factor).toBeLessThan(1.02);
  });
});
