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
import { BOLTZMANN, ELECTRON_MASS, ELEMENTARY_CHARGE, K_OVER_E, PLANCK } from './constants';
import type { MaterialFamily, Properties } from './material-family';
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
};

const LN10 = Math.LN10;
const LN300 = Math.log(300);
/** ln of 4π(2·m_e·k/h²)^{3/2} [m⁻³ K^{-3/2}]: N(T) = e^this·(m*·T)^{3/2}. */
const LN_DOS_PREFACTOR = Math.log(4 * Math.PI * Math.pow((2 * ELECTRON_MASS * BOLTZMANN) / (PLANCK * PLANCK), 1.5));
const LN_CM3_TO_M3 = Math.log(1e6);
// Module-local copies: under tsx an imported binding is read through a
// getter on every access, which shows in the integrator's inner loop.
const CHARGE = ELEMENTARY_CHARGE;
const KE = K_OVER_E;
const K_OVER_E_SQ = K_OVER_E * K_OVER_E;
const factorsInto = bandFactorsInto;

/** Band-model temperatures the engine accepts [K]; beyond, one band at fixed doping is no model. */
export const BAND_MIN_TEMPERATURE = 1;
export const BAND_MAX_TEMPERATURE = 2000;

/** ln(n/N(T)): the table variable, from log10(n/cm⁻³) and T. */
export function reducedConcentrationLog(p: BandParameters, log10Doping: number, temperature: number): number {
  return LN10 * log10Doping + LN_CM3_TO_M3 - LN_DOS_PREFACTOR - 1.5 * Math.log(p.effectiveMass * temperature);
}

export function bandFamily(p: BandParameters): MaterialFamily {
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
