/**
 * Two-band (bipolar) family: the majority band of band-model.ts plus a
 * minority band across the gap, each a parabolic band with acoustic-phonon
 * scattering. For a p-type family (holes majority, electrons minority):
 *
 *   p = Nv(T)·F½(η),  n = Nc(T)·F½(ηₙ),  ηₙ = −η − Eg(T)/kT,  Eg(T) = Eg0 − β·T
 *   charge neutrality  p − n = N  (N = the family's doping, the net doping)
 *   σ = σp + σn,  S = (σp·Sp + σn·Sn)/σ
 *   κ = κL + (Lp·σp + Ln·σn)·T + σp·σn/σ·(Sp − Sn)²·T
 *
 * (H. J. Goldsmid, Introduction to Thermoelectricity, Springer 2010, the
 * chapter on bipolar effects; from memory.) An n-type family is the mirror
 * image. Each band's S, L and mobility factor come from the same tables as
 * the single band (band-tables.ts), at its own reduced concentration.
 *
 * Neutrality is solved for u = ln(p/Nv) by safeguarded Newton, starting at
 * u₀ = ln(N/Nv) (no minority carriers, where p − n − N ≤ 0). The residual
 * in log form, h(u) = ln(p/N) − ln(1 + n/N), is increasing with slope
 * between 1 and 2-ish, so the first step is already good to (n/N)² — one
 * or two iterations in an extrinsic sample, 4–6 near intrinsic. Iterations
 * stop once a step falls below 1e-7, leaving an error ~1e-14 in u; the
 * tables themselves are good to ~2e-10 (see two-band-model.test.ts). When
 * the minority band holds less than 1e-20 of the carriers at u₀ it is left
 * out altogether, so a family with a wide gap gives exactly the single band's
 * numbers.
 */
import { bandEtaInto, bandFactorsEtaInto, bandFactorsInto, type FactorEtaOut, type FactorOut } from './band-tables';
import type { BandParameters, MinorityBand } from './band-model';
import { BAND_MAX_TEMPERATURE, BAND_MIN_TEMPERATURE, ELEMENTARY_CHARGE, K_OVER_E, LN_DOS_PREFACTOR } from './constants';
import { ETA_LOW, logFermiHalfInto, type LogFermiOut } from './fermi-half-log';
import type { MaterialFamily, Properties } from './material-family';
import { cm2PerVsToM2PerVs } from '../units';

const LN10 = Math.LN10;
const LN300 = Math.log(300);
const LN_CM3_TO_M3 = Math.log(1e6);
const CHARGE = ELEMENTARY_CHARGE;
const KE = K_OVER_E;
const K_OVER_E_SQ = K_OVER_E * K_OVER_E;
/** n/N below which the minority band is dropped: its share of σ, S and κ is then below double precision. */
const NEGLIGIBLE = 1e-20;
const MAX_ITERATIONS = 60;
// Module-local copies: under tsx an imported binding is read through a getter on every access (see band-model.ts).
const factorsEtaInto = bandFactorsEtaInto;
const etaInto = bandEtaInto;
const ETA_TABLE_LOW = ETA_LOW;
const factorsInto = bandFactorsInto;
const logHalfInto = logFermiHalfInto;

/** Both bands' conductivities at one (n, T), with the densities behind them. */
type BandSplit = { sigmaMajority: number; sigmaMinority: number; majorityDensity: number; minorityDensity: number; minorityEta: number; iterations: number };

/** Temperature [K] at which Eg0 − β·T reaches 0 (Infinity when the gap never closes). */
export function gapClosingTemperature(m: MinorityBand): number {
  return m.bandGapSlope > 0 ? m.bandGap / m.bandGapSlope : Infinity;
}

/** 1/2^{3/2}: F½(η) = Γ(3/2)·z·(1 − z/2^{3/2} + …), z = e^η, for a non-degenerate band. */
const C1 = 1 / (2 * Math.SQRT2);
const SQRT_PI_2 = Math.sqrt(Math.PI) / 2;

function twoBandSolver(p: BandParameters, m: MinorityBand) {
  const muMajority = cm2PerVsToM2PerVs(p.mobility300);
  const muMinority = cm2PerVsToM2PerVs(m.mobility300);
  const uOffset = -LN_DOS_PREFACTOR - 1.5 * Math.log(p.effectiveMass);
  /** ln(N_minority/N_majority): the two bands' effective densities of states differ by (m_min/m_maj)^{3/2}. */
  const lnDosRatio = 1.5 * Math.log(m.effectiveMass / p.effectiveMass);
  const majority: FactorEtaOut = { seebeck: 0, lorenz: 0, mobility: 0, eta: 0, etaSlope: 1 };
  const minority: FactorOut = { seebeck: 0, lorenz: 0, mobility: 0 };
  const logHalf: LogFermiOut = { value: 0, slope: 1 };
  const split: BandSplit = { sigmaMajority: 0, sigmaMinority: 0, majorityDensity: 0, minorityDensity: 0, minorityEta: 0, iterations: 0 };
  // Written by minorityAt: x = n/N, gSlope = d ln F½/dη at ηₙ, and z = e^ηₙ (NaN when ηₙ is inside the table).
  // Fields of an object, not closure variables: V8 boxes every double written to a closure's context (garbage in the inner loop).
  const at = { x: 0, gSlope: 1, z: 0, scale: 0 };

  /**
   * n/N at the minority level ηₙ. A non-degenerate minority band (ηₙ below
   * the table, the usual case) costs one exponential: F½ = Γ(3/2)·z(1 − z/2^{3/2}),
   * exact to z³ ≈ 1e-19.
   */
  function minorityAt(etaN: number, lnK: number): void {
    if (etaN < ETA_TABLE_LOW) {
      const z = Math.exp(etaN);
      // e^lnK·Γ(3/2), once per solve and only on this branch.
      if (Number.isNaN(at.scale)) at.scale = Math.exp(lnK) * SQRT_PI_2;
      at.z = z;
      at.x = at.scale * z * (1 - C1 * z);
      at.gSlope = 1 - C1 * z;
      return;
    }
    at.z = NaN;
    logHalfInto(etaN, logHalf);
    at.x = Math.exp(lnK + logHalf.value);
    at.gSlope = logHalf.slope;
  }

  /**
   * Charge neutrality and both bands' conductivities into split; the
   * factors are left in majority/minority. sigmaMinority = 0 means the
   * minority band was dropped (NEGLIGIBLE).
   */
  function solve(log10Doping: number, temperature: number, lnT: number): void {
    const lnN = LN10 * log10Doping + LN_CM3_TO_M3; // ln(N / m⁻³)
    const u0 = lnN + uOffset - 1.5 * lnT;
    const gap = (m.bandGap - m.bandGapSlope * temperature) / (KE * temperature); // Eg/kT; k/e in V/K is k in eV/K
    const lnK = lnDosRatio - u0; // ln(N_minority/N): n/N = e^lnK·F½(ηₙ)
    at.scale = NaN;
    // d = u − u0 = ln(p/N); the root has p = N + n, so d ≥ 0.
    let d = 0;
    let lo = 0;
    let hi = Infinity;
    let k = 0;
    for (; k < MAX_ITERATIONS; k++) {
      etaInto(u0 + d, majority);
      minorityAt(-majority.eta - gap, lnK);
      const x = at.x;
      if (k === 0 && !(x > NEGLIGIBLE)) break;
      // h(d) = d − ln(1 + x); dh/dd = 1 + f·G′(ηₙ)·dη/du, f = x/(1 + x).
      const f = x / (1 + x);
      const h = d - Math.log1p(x);
      const step = -h / (1 + f * at.gSlope * majority.etaSlope);
      if (h < 0) lo = d;
      else hi = d;
      let next = d + step;
      // Outside the bracket (never while h is concave, as it is for Boltzmann statistics): bisect.
      if (!(next >= lo && next <= hi)) next = 0.5 * (lo + hi);
      const taken = next - d;
      d = next;
      // Newton's error after a step is ~ (h″/2h′)·step², and h″ is of order f: stop when that is below 1e-14.
      if (f * taken * taken * (1 + majority.etaSlope * majority.etaSlope) < 1e-14 || Math.abs(taken) < 1e-15) break;
    }
    split.iterations = k;
    factorsEtaInto(u0 + d, majority);
    const etaN = -majority.eta - gap;
    const tr = lnT - LN300;
    const density = Math.exp(lnN);
    split.minorityEta = etaN;
    if (k === 0 && !(at.x > NEGLIGIBLE)) {
      // No minority carriers worth a bit: exactly the single band.
      split.majorityDensity = density;
      split.minorityDensity = 0;
      split.sigmaMinority = 0;
      split.sigmaMajority = density * CHARGE * (muMajority * Math.exp(p.mobilityExponent * tr) * majority.mobility);
      return;
    }
    minorityAt(etaN, lnK);
    const { x, z } = at;
    if (Number.isNaN(z)) factorsInto(logHalf.value, minority);
    else {
      // Non-degenerate closed forms (nonDegenerateFactors in band-tables.ts) at z = e^ηₙ.
      minority.seebeck = 2 + z / 2 - etaN;
      minority.lorenz = 2 + z / 4;
      minority.mobility = 1 - z * (0.5 - C1);
    }
    // p = N + n at the root (to ~1e-14), so one exponential gives both densities.
    split.majorityDensity = density * (1 + x);
    split.minorityDensity = density * x;
    const majorityPower = Math.exp(p.mobilityExponent * tr);
    split.sigmaMajority = split.majorityDensity * CHARGE * (muMajority * majorityPower * majority.mobility);
    const minorityPower = m.mobilityExponent === p.mobilityExponent ? majorityPower : Math.exp(m.mobilityExponent * tr);
    split.sigmaMinority = split.minorityDensity * CHARGE * (muMinority * minorityPower * minority.mobility);
  }

  return { solve, split, majority, minority };
}

export function twoBandFamily(p: BandParameters, m: MinorityBand): MaterialFamily {
  const sign = p.carrier === 'n' ? -1 : 1;
  const { solve, split, majority, minority } = twoBandSolver(p, m);
  return {
    kind: 'band',
    sign,
    minTemperature: BAND_MIN_TEMPERATURE,
    // Eg0 − β·T is a straight-line fit; past the point where it closes the gap it means nothing.
    maxTemperature: Math.min(BAND_MAX_TEMPERATURE, gapClosingTemperature(m)),
    minLog10Doping: 14,
    maxLog10Doping: 22,
    properties(log10Doping: number, temperature: number, out: Properties) {
      const lnT = Math.log(temperature);
      solve(log10Doping, temperature, lnT);
      const sp = split.sigmaMajority;
      const lattice = p.latticeKappa300 * Math.exp(p.latticeKappaExponent * (lnT - LN300));
      const seebeckMajority = sign * KE * majority.seebeck;
      if (split.sigmaMinority === 0) {
        // The single band's formulas, term for term.
        out.seebeck = seebeckMajority;
        out.sigma = sp;
        out.kappa = lattice + K_OVER_E_SQ * majority.lorenz * sp * temperature;
        return;
      }
      const sn = split.sigmaMinority;
      const seebeckMinority = -sign * KE * minority.seebeck;
      const sigma = sp + sn;
      const difference = seebeckMajority - seebeckMinority;
      out.seebeck = (sp * seebeckMajority + sn * seebeckMinority) / sigma;
      out.sigma = sigma;
      out.kappa = lattice + K_OVER_E_SQ * (majority.lorenz * sp + minority.lorenz * sn) * temperature + ((sp * sn) / sigma) * difference * difference * temperature;
    },
    minorityShare(log10Doping: number, temperature: number): number {
      solve(log10Doping, temperature, Math.log(temperature));
      return split.sigmaMinority / (split.sigmaMajority + split.sigmaMinority);
    },
  };
}

/**
 * The neutrality solution at one (n, T), for tests and reports (not the hot
 * path): majority and minority densities [m⁻³], reduced Fermi levels and
 * Newton iterations, from the same solver the family uses.
 */
export function neutralitySolution(p: BandParameters, m: MinorityBand, perCm3: number, temperature: number) {
  const solver = twoBandSolver(p, m);
  solver.solve(Math.log10(perCm3), temperature, Math.log(temperature));
  const { split, majority } = solver;
  return { majorityDensity: split.majorityDensity, minorityDensity: split.minorityDensity, eta: majority.eta, minorityEta: split.minorityEta, iterations: split.iterations };
}
