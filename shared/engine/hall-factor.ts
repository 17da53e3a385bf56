/**
 * Hall factor of one parabolic band with acoustic-phonon scattering
 * (τ ∝ E^{-1/2}), the band model's majority band:
 *
 *   r_H = (3/2)·F½(η)·F₋½(η) / (2·F₀(η)²),   unnormalised F_j as in fermi-integrals.ts,
 *
 * from 3π/8 ≈ 1.178 when non-degenerate (F_j → Γ(j+1)·e^η) to 1 when
 * degenerate (F_j → η^{j+1}/(j+1)). A Hall measurement gives
 * p_H = 1/(e·R_H) = p / r_H, so the carrier concentration is p = r_H·p_H —
 * with η itself depending on p, hence the iteration in hallCorrection.
 */
import { bandFactors } from './band-tables';
import { fermiIntegralsByQuadrature, fermiZero } from './fermi-integrals';
import { reducedConcentrationLog, type BandParameters } from './band-model';

/** r_H at reduced Fermi level η. */
export function hallFactorAt(eta: number): number {
  const [fHalf, fMinusHalf] = fermiIntegralsByQuadrature(eta, [0.5, -0.5]) as [number, number];
  const f0 = fermiZero(eta);
  return (1.5 * fHalf * fMinusHalf) / (2 * f0 * f0);
}

export type HallCorrection = { factor: number; perCm3: number; eta: number; iterations: number };

/**
 * The carrier concentration behind a measured Hall concentration (cm⁻³) at
 * temperature T: p = r_H(η(p))·p_H by fixed-point iteration. r_H changes by
 * at most ~18 % over all η and slowly with p, so a few steps reach 1e-12.
 * Only the majority band's density-of-states mass matters here (a two-band
 * family passes its majority band's parameters).
 */
export function hallCorrection(band: Pick<BandParameters, 'effectiveMass'>, hallPerCm3: number, temperature: number): HallCorrection {
  const params = { carrier: 'p', effectiveMass: band.effectiveMass, mobility300: 1, mobilityExponent: 0, latticeKappa300: 1, latticeKappaExponent: 0 } as const;
  let factor = 1;
  let eta = 0;
  let iterations = 0;
  for (; iterations < 50; iterations += 1) {
    const p = factor * hallPerCm3;
    eta = bandFactors(reducedConcentrationLog(params, Math.log10(p), temperature)).eta;
    const next = hallFactorAt(eta);
    const done = Math.abs(next - factor) < 1e-12;
    factor = next;
    if (done) break;
  }
  return { factor, perCm3: factor * hallPerCm3, eta, iterations: iterations + 1 };
}
