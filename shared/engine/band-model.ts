/**
 * Single parabolic band, acoustic-phonon scattering (energy-independent mean
 * free path, τ ∝ E^{-1/2}), for holes (p) or electrons (n):
 *   n = 4π(2m*kT/h²)^{3/2}·F½(η)
 *   S = ±(k/e)(2F₁/F₀ − η)              (+ for p, − for n)
 *   μ = μ₀(T)·(√π/2)·F₀/F½,  μ₀(T) = μ₃₀₀·(T/300 K)^a   (non-degenerate drift mobility)
 *   σ = n·e·μ
 *   L = (k/e)²·(3F₀F₂ − 4F₁²)/F₀²
 *   κ = κ_L(T) + L·σ·T,  κ_L(T) = κ_L,300·(T/300 K)^b
 * The Fermi-integral work is in band-tables.ts; here only logs, exps and one
 * table lookup per call.
 */
import { bandFactorsInto, type FactorOut } from './band-tables';
import { BAND_MAX_TEMPERATURE, BAND_MIN_TEMPERATURE, ELEMENTARY_CHARGE, K_OVER_E, LN_DOS_PREFACTOR } from './constants';
import type { MaterialFamily, Properties } from './material-family';
import { twoBandFamily } from './two-band-model';
import { cm2PerVsToM2PerVs } from '../units';

export type BandParameters = {
  carrier: 'p' | 'n';
  /** Density-of-states effective mass over the free-electron mass. */
  effectiveMass: number;
  /** Non-degenerate drift mobility at 300 K [cm²/(V·s)]. */
  mobility300: number;
  /** Exponent a in μ₀ ∝ (T/300 K)^a (−1.5 for acoustic phonons). */
  mobilityExponent: number;
  /** Lattice thermal conductivity at 300 K [W/(m·K)]. */
  latticeKappa300: number;
  /** Exponent b in κ_L ∝ (T/300 K)^b (−1 for umklapp scattering). */
  latticeKappaExponent: number;
  /** The band across the gap (electrons of a p-type family, holes of an n-type one); absent: one band, no bipolar conduction. */
  minority?: MinorityBand;
};

/** The minority band of a two-band family: parabolic, acoustic-phonon scattering, like the majority band. */
export type MinorityBand = {
  /** Density-of-states effective mass over the free-electron mass. */
  effectiveMass: number;
  /** Non-degenerate drift mobility at 300 K [cm²/(V·s)]. */
  mobility300: number;
  /** Exponent in μ₀ ∝ (T/300 K)^a. */
  mobilityExponent: number;
  /** Band gap at 0 K, Eg0 [eV]. */
  bandGap: number;
  /** β in Eg(T) = Eg0 − β·T [eV/K] (positive: the gap narrows as T rises). */
  bandGapSlope: number;
};

const LN10 = Math.LN10;
const LN300 = Math.log(300);
const LN_CM3_TO_M3 = Math.log(1e6);
// Module-local copies: under tsx an imported binding is read through a
// getter on every access, which shows in the integrator's inner loop.
const CHARGE = ELEMENTARY_CHARGE;
const KE = K_OVER_E;
const K_OVER_E_SQ = K_OVER_E * K_OVER_E;
const factorsInto = bandFactorsInto;

export { BAND_MIN_TEMPERATURE, BAND_MAX_TEMPERATURE };

/** ln(n/N(T)): the table variable, from log10(n/cm⁻³) and T. */
export function reducedConcentrationLog(p: BandParameters, log10Doping: number, temperature: number): number {
  return LN10 * log10Doping + LN_CM3_TO_M3 - LN_DOS_PREFACTOR - 1.5 * Math.log(p.effectiveMass * temperature);
}

/** The band-model family: one band, or two (two-band-model.ts) when a minority band is given. */
export function bandFamily(p: BandParameters): MaterialFamily {
  if (p.minority) return twoBandFamily(p, p.minority);
  const sign = p.carrier === 'n' ? -1 : 1;
  const mu300 = cm2PerVsToM2PerVs(p.mobility300);
  const uOffset = -LN_DOS_PREFACTOR - 1.5 * Math.log(p.effectiveMass);
  const factors: FactorOut = { seebeck: 0, lorenz: 0, mobility: 0 };
  return {
    kind: 'band',
    sign,
    minTemperature: BAND_MIN_TEMPERATURE,
    maxTemperature: BAND_MAX_TEMPERATURE,
    minLog10Doping: 14,
    maxLog10Doping: 22,
    properties(log10Doping: number, temperature: number, out: Properties) {
      const lnT = Math.log(temperature);
      const lnN = LN10 * log10Doping + LN_CM3_TO_M3; // ln(n / m⁻³)
      factorsInto(lnN + uOffset - 1.5 * lnT, factors);
      const mobility = mu300 * Math.exp(p.mobilityExponent * (lnT - LN300)) * factors.mobility;
      const sigma = Math.exp(lnN) * CHARGE * mobility;
      out.seebeck = sign * KE * factors.seebeck;
      out.sigma = sigma;
      out.kappa = p.latticeKappa300 * Math.exp(p.latticeKappaExponent * (lnT - LN300)) + K_OVER_E_SQ * factors.lorenz * sigma * temperature;
    },
  };
}
