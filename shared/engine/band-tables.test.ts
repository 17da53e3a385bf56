import { bandFactors, degenerateFactors, factorsByQuadrature, factorsFromIntegrals, nonDegenerateFactors, U_HIGH, U_LOW, U_STEP } from './band-tables';
import { fermiIntegralsByQuadrature, fermiZero } from './fermi-integrals';

const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('band-model tables', () => {
  test('interpolated factors match direct quadrature at off-grid points to 1e-9', () => {
    // Points deliberately between grid nodes (golden-ratio sequence), across the whole table.
    let worst = 0;
    for (let k = 0; k < 120; k++) {
      const u = U_LOW + (U_HIGH - U_LOW) * ((k * 0.6180339887498949 + 0.1234) % 1);
      const table = bandFactors(u);
      const direct = factorsByQuadrature(u);
      worst = Math.max(
        worst,
        relative(table.seebeck, direct.seebeck),
        relative(table.lorenz, direct.lorenz),
        relative(table.mobility, direct.mobility),
        Math.abs(table.eta - direct.eta) / Math.max(1, Math.abs(direct.eta)),
      );
    }
    expect(worst).toBeLessThan(1e-9);
  });

  test('the reduced Fermi level solves F½(η) = e^u', () => {
    for (const u of [-14, -3.3, 0.01, 2.7, 5.4]) {
      const { eta } = bandFactors(u);
      expect(relative(fermiIntegralsByQuadrature(eta, [0.5])[0], Math.exp(u))).toBeLessThan(1e-9);
    }
  });

  test('the asymptotic forms outside the table agree with quadrature and join the table smoothly', () => {
    for (const u of [U_LOW - 3, U_LOW]) {
      const a = nonDegenerateFactors(u);
      const q = factorsByQuadrature(u);
      expect(relative(a.seebeck, q.seebeck)).toBeLessThan(1e-11);
      expect(relative(a.lorenz, q.lorenz)).toBeLessThan(1e-11);
      expect(relative(a.mobility, q.mobility)).toBeLessThan(1e-11);
    }
    for (const u of [U_HIGH, U_HIGH + 2]) {
      const a = degenerateFactors(u);
      const q = factorsByQuadrature(u);
      expect(relative(a.seebeck, q.seebeck)).toBeLessThan(1e-9);
      // ℓ = (3F0F2 − 4F1²)/F0² cancels ~3 digits at η ≈ 50, so the quadrature
      // side is the less accurate one here.
      expect(relative(a.lorenz, q.lorenz)).toBeLessThan(1e-9);
      expect(relative(a.mobility, q.mobility)).toBeLessThan(1e-11);
    }
    // Continuity across the joins (a jump would upset the adaptive integrator).
    const eps = 1e-12;
    expect(relative(bandFactors(U_LOW - eps).seebeck, bandFactors(U_LOW + eps).seebeck)).toBeLessThan(1e-10);
    expect(relative(bandFactors(U_HIGH - eps).lorenz, bandFactors(U_HIGH + eps).lorenz)).toBeLessThan(1e-10);
    expect(U_STEP).toBeLessThanOrEqual(0.02);
  });

  test('Lorenz factor limits: 2 non-degenerate, π²/3 degenerate (acoustic-phonon scattering)', () => {
    // Handbook values for r = −½ scattering, e.g. G. S. Nolas, J. Sharp,
    // H. J. Goldsmid, Thermoelectrics (Springer 2001), ch. 2 (from memory):
    // L = 2(k/e)² when non-degenerate, the Sommerfeld value π²/3·(k/e)² when degenerate.
    expect(bandFactors(-25).lorenz).toBeCloseTo(2, 9);
    expect(relative(bandFactors(12).lorenz, (Math.PI * Math.PI) / 3)).toBeLessThan(1e-5);
  });

  test('factorsFromIntegrals uses F0 = ln(1+e^η) consistently with quadrature', () => {
    const eta = 1.7;
    const [fh, f1, f2, f0] = fermiIntegralsByQuadrature(eta, [0.5, 1, 2, 0]);
    const a = factorsFromIntegrals(eta, fermiZero(eta), fh, f1, f2);
    const b = factorsFromIntegrals(eta, f0, fh, f1, f2);
    expect(relative(a.seebeck, b.seebeck)).toBeLessThan(1e-13);
  });
});
