import { bandFamily, type BandParameters, type MinorityBand } from './band-model';
import { factorsFromIntegrals } from './band-tables';
import { parseCase } from './check-case';
import { BOLTZMANN, ELECTRON_MASS, ELEMENTARY_CHARGE, K_OVER_E, LN_DOS_PREFACTOR, PLANCK } from './constants';
import { fermiIntegralsByQuadrature, fermiZero } from './fermi-integrals';
import type { Properties } from './material-family';
import { optimizeLeg } from './run-case';
import { neutralitySolution } from './two-band-model';

const majority: BandParameters = { carrier: 'p', effectiveMass: 1, mobility300: 350, mobilityExponent: -1.5, latticeKappa300: 1, latticeKappaExponent: -1 };
const minority: MinorityBand = { effectiveMass: 0.8, mobility300: 600, mobilityExponent: -1.5, bandGap: 0.2, bandGapSlope: 1e-4 };
const relative = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const K_E2 = K_OVER_E * K_OVER_E;

const at = (p: BandParameters, log10Doping: number, temperature: number): Properties => {
  const out = { seebeck: 0, sigma: 0, kappa: 0 };
  bandFamily(p).properties(log10Doping, temperature, out);
  return out;
};

/** N(T) = 4π(2m*kT/h²)^{3/2} [m⁻³], the engine's effective density of states (= 2(2πm*kT/h²)^{3/2}·2/√π). */
const dos = (mass: number, t: number) => Math.exp(LN_DOS_PREFACTOR + 1.5 * Math.log(mass * t));
/** The textbook effective density of states Nc, Nv = 2(2πm*kT/h²)^{3/2} [m⁻³] (S. M. Sze, Physics of Semiconductor Devices, 2nd ed. 1981, ch. 1). */
const textbookDos = (mass: number, t: number) => 2 * Math.pow((2 * Math.PI * mass * ELECTRON_MASS * BOLTZMANN * t) / (PLANCK * PLANCK), 1.5);

/**
 * Independent reference: neutrality by bisection on η with Fermi integrals
 * by direct quadrature (no tables), each band's S, L and mobility factor
 * from the integrals, combined as in the model's definition.
 */
function reference(p: BandParameters, m: MinorityBand, perCm3: number, t: number) {
  const nv = dos(p.effectiveMass, t);
  const nc = dos(m.effectiveMass, t);
  const net = perCm3 * 1e6;
  const gap = (m.bandGap - m.bandGapSlope * t) / (K_OVER_E * t);
  const half = (eta: number) => fermiIntegralsByQuadrature(eta, [0.5])[0];
  const residual = (eta: number) => nv * half(eta) - nc * half(-eta - gap) - net;
  let a = -80;
  let b = 80;
  for (let i = 0; i < 90; i++) {
    const c = 0.5 * (a + b);
    if (residual(c) < 0) a = c;
    else b = c;
  }
  const eta = 0.5 * (a + b);
  const band = (e: number) => {
    const [fh, f1, f2] = fermiIntegralsByQuadrature(e, [0.5, 1, 2]);
    return { density: 0, ...factorsFromIntegrals(e, fermiZero(e), fh, f1, f2), fh };
  };
  const maj = band(eta);
  const min = band(-eta - gap);
  const power = (x: number) => Math.pow(t / 300, x);
  const sigmaP = nv * maj.fh * ELEMENTARY_CHARGE * p.mobility300 * 1e-4 * power(p.mobilityExponent) * maj.mobility;
  const sigmaN = nc * min.fh * ELEMENTARY_CHARGE * m.mobility300 * 1e-4 * power(m.mobilityExponent) * min.mobility;
  const sp = K_OVER_E * maj.seebeck;
  const sn = -K_OVER_E * min.seebeck;
  const sigma = sigmaP + sigmaN;
  return {
    eta,
    holes: nv * maj.fh,
    electrons: nc * min.fh,
    seebeck: (sigmaP * sp + sigmaN * sn) / sigma,
    sigma,
    kappa: p.latticeKappa300 * power(p.latticeKappaExponent) + K_E2 * (maj.lorenz * sigmaP + min.lorenz * sigmaN) * t + ((sigmaP * sigmaN) / sigma) * (sp - sn) ** 2 * t,
    share: sigmaN / sigma,
  };
}

describe('two-band (bipolar) family', () => {
  test('with a very wide gap it is the single-band family, to 1e-9 (in fact bit for bit)', () => {
    const wide = { ...majority, minority: { ...minority, bandGap: 8, bandGapSlope: 0 } };
    let worst = 0;
    for (let y = 14; y <= 22; y += 0.5) {
      for (const t of [20, 77, 150, 300, 450, 700, 1000]) {
        const one = at(majority, y, t);
        const two = at(wide, y, t);
        worst = Math.max(worst, relative(two.seebeck, one.seebeck), relative(two.sigma, one.sigma), relative(two.kappa, one.kappa));
      }
    }
    expect(worst).toBeLessThanOrEqual(1e-9);
    const leg = (material: object) => optimizeLeg(parseCase({ hotSide: 300, length: 1e-3, area: 1e-6, material: { kind: 'band', ...material }, bounds: { minPerCm3: 1e18, maxPerCm3: 1e20 }, controlPoints: 5 }, 'optimize'));
    const single = leg(majority);
    const double = leg(wide);
    expect(relative(double.deltaT, single.deltaT)).toBeLessThanOrEqual(1e-9);
    expect(relative(double.current, single.current)).toBeLessThanOrEqual(1e-9);
  });

  test('S, σ, κ and the minority share agree with direct quadrature and bisection to 1e-8 (extrinsic, bipolar, intrinsic, degenerate)', () => {
    // The model as defined in H. J. Goldsmid, Introduction to Thermoelectricity
    // (Springer 2010), chapter on bipolar effects (from memory): p − n = N,
    // σ = σp + σn, S = (σpSp + σnSn)/σ, κ = κL + (Lpσp + Lnσn)T + σpσn/σ·(Sp − Sn)²T.
    const family = bandFamily({ ...majority, minority });
    let worst = 0;
    for (const perCm3 of [1e14, 1e17, 1e18, 3e18, 1e19, 4e19, 1e20, 1e21]) {
      for (const t of [150, 250, 300, 400, 600]) {
        const ref = reference(majority, minority, perCm3, t);
        const got = at({ ...majority, minority }, Math.log10(perCm3), t);
        const share = family.minorityShare?.(Math.log10(perCm3), t) ?? NaN;
        worst = Math.max(worst, relative(got.seebeck, ref.seebeck), relative(got.sigma, ref.sigma), relative(got.kappa, ref.kappa), Math.abs(share - ref.share));
      }
    }
    expect(worst).toBeLessThan(1e-8);
  });

  test('charge neutrality holds: Nv·F½(η) − Nc·F½(−η − Eg/kT) = N by quadrature at the solver\'s η, to 1e-9', () => {
    let worst = 0;
    for (const perCm3 of [1e14, 1e16, 1e18, 5e18, 2e19, 1e20, 1e22]) {
      for (const t of [100, 300, 500, 1000]) {
        const s = neutralitySolution(majority, minority, perCm3, t);
        const [holes] = fermiIntegralsByQuadrature(s.eta, [0.5]);
        const [electrons] = fermiIntegralsByQuadrature(s.minorityEta, [0.5]);
        const p = dos(majority.effectiveMass, t) * holes;
        const n = dos(minority.effectiveMass, t) * electrons;
        // Relative to the larger of the terms: in the intrinsic limit p and n nearly cancel.
        worst = Math.max(worst, Math.abs(p - n - perCm3 * 1e6) / Math.max(p, perCm3 * 1e6));
        expect(s.iterations).toBeLessThan(12);
      }
    }
    expect(worst).toBeLessThan(1e-9);
  });

  // Non-degenerate intrinsic sample: a gap of 0.6 eV at 300 K puts both
  // Fermi levels ~11.6 kT from their band edges (Boltzmann statistics good to
  // ~3e-6), and a net doping of 1e10 cm⁻³ is ~4e-5 of ni.
  const wideIntrinsic: MinorityBand = { effectiveMass: 0.5, mobility300: 900, mobilityExponent: -1.5, bandGap: 0.6, bandGapSlope: 0 };
  const heavy: BandParameters = { ...majority, effectiveMass: 1 };
  const T = 300;
  const gapKT = wideIntrinsic.bandGap / (K_OVER_E * T);
  const b = wideIntrinsic.mobility300 / heavy.mobility300;
  const ni = Math.sqrt(textbookDos(heavy.effectiveMass, T) * textbookDos(wideIntrinsic.effectiveMass, T)) * Math.exp(-gapKT / 2);

  test('intrinsic limit: n = p = ni = √(NcNv)·exp(−Eg/2kT), σ = ni·e·(μp + μn), minority share b/(1 + b)', () => {
    // ni: S. M. Sze, Physics of Semiconductor Devices, 2nd ed. (1981), ch. 1;
    // H. J. Goldsmid, Introduction to Thermoelectricity (2010), bipolar chapter (both from memory).
    expect(ni / 1e6).toBeGreaterThan(1e13);
    const s = neutralitySolution(heavy, wideIntrinsic, 1e10, T);
    expect(relative(s.majorityDensity, ni)).toBeLessThan(1e-4);
    expect(relative(s.minorityDensity, ni)).toBeLessThan(1e-4);
    const got = at({ ...heavy, minority: wideIntrinsic }, 10, T);
    expect(relative(got.sigma, ni * ELEMENTARY_CHARGE * (heavy.mobility300 + wideIntrinsic.mobility300) * 1e-4)).toBeLessThan(1e-4);
    const share = bandFamily({ ...heavy, minority: wideIntrinsic }).minorityShare?.(10, T) ?? NaN;
    expect(Math.abs(share - b / (1 + b))).toBeLessThan(1e-4);
  });

  test('intrinsic Seebeck coefficient: S = (k/e)·[−(b − 1)/(b + 1)·(Eg/2kT + 2) + ¾·ln(mp/mn)], b = μn/μp', () => {
    // Goldsmid, Introduction to Thermoelectricity (2010), bipolar chapter, for
    // acoustic-phonon scattering (the "2" is r + 5/2 with r = −½); from memory.
    // Here b = 900/350 makes electrons win: S is negative in a p-type family.
    const got = at({ ...heavy, minority: wideIntrinsic }, 10, T);
    const expected = K_OVER_E * (-((b - 1) / (b + 1)) * (gapKT / 2 + 2) + 0.75 * Math.log(heavy.effectiveMass / wideIntrinsic.effectiveMass));
    expect(got.seebeck).toBeLessThan(0);
    expect(relative(got.seebeck, expected)).toBeLessThan(1e-4);
  });

  test('bipolar thermal conductivity: κ − κL − 2(k/e)²σT = (k/e)²·σT·b/(1 + b)²·(Eg/kT + 4)², positive', () => {
    // Goldsmid, Introduction to Thermoelectricity (2010), bipolar chapter
    // (from memory): in an intrinsic non-degenerate sample the bipolar term
    // is σpσn/σ·(Sp − Sn)²·T with Sp − Sn = (k/e)(Eg/kT + 4) for r = −½.
    const got = at({ ...heavy, minority: wideIntrinsic }, 10, T);
    const bipolar = got.kappa - heavy.latticeKappa300 - 2 * K_E2 * got.sigma * T;
    const expected = K_E2 * got.sigma * T * (b / (1 + b) ** 2) * (gapKT + 4) ** 2;
    expect(bipolar).toBeGreaterThan(0);
    expect(relative(bipolar, expected)).toBeLessThan(1e-4);
    // It dwarfs the carriers' ordinary heat conduction here (Eg/kT ≈ 23).
    expect(bipolar / (2 * K_E2 * got.sigma * T)).toBeGreaterThan(50);
  });

  test('a narrow gap pulls S down at low doping and high temperature, and leaves a heavily doped cold end alone', () => {
    // Goldsmid (2010), bipolar chapter: the Seebeck coefficient peaks and falls
    // once minority carriers are excited; the peak Smax ≈ Eg/(2eT) (the
    // Goldsmid–Sharp estimate, J. Electron. Mater. 28, 869 (1999), from memory).
    const two = { ...majority, minority };
    const light = at(two, 18, 400);
    const single = at(majority, 18, 400);
    expect(light.seebeck).toBeLessThan(0.5 * single.seebeck);
    const heavyDoped = at(two, Math.log10(4e19), 200);
    expect(relative(heavyDoped.seebeck, at(majority, Math.log10(4e19), 200).seebeck)).toBeLessThan(1e-4);
    // Peak of S over doping at 300 K against Eg/(2eT): the estimate is good to ~20 %.
    let peak = 0;
    for (let y = 14; y <= 20; y += 0.01) peak = Math.max(peak, at(two, y, 300).seebeck);
    const eg = minority.bandGap - minority.bandGapSlope * 300;
    expect(relative(peak, eg / (2 * 300))).toBeLessThan(0.2);
  });

  test('an n-type two-band family is the mirror image: S changes sign, σ and κ do not', () => {
    for (const [y, t] of [[18, 350], [19.3, 250], [14, 400]]) {
      const p = at({ ...majority, minority }, y, t);
      const n = at({ ...majority, carrier: 'n', minority }, y, t);
      expect(n.seebeck).toBe(-p.seebeck);
      expect(n.sigma).toBe(p.sigma);
      expect(n.kappa).toBe(p.kappa);
    }
  });

  test('the temperature range ends where the gap closes', () => {
    expect(bandFamily({ ...majority, minority }).maxTemperature).toBeCloseTo(2000, 9);
    expect(bandFamily({ ...majority, minority: { ...minority, bandGapSlope: 4e-4 } }).maxTemperature).toBeCloseTo(500, 9);
    expect(bandFamily({ ...majority, minority: { ...minority, bandGapSlope: -3e-4 } }).maxTemperature).toBe(2000);
  });
});

describe('minority band in a case: validation names the field', () => {
  const leg = (minorityInput: unknown, extra: object = {}) => () =>
    parseCase({ hotSide: 300, length: 1e-3, area: 1e-6, current: 3, doping: 1e19, material: { kind: 'band', ...majority, minority: minorityInput }, ...extra }, 'solve');
  const message = (fn: () => unknown) => {
    try {
      fn();
    } catch (e) {
      // A CaseError's message is "field: what is wrong".
      return (e as Error).message;
    }
    return 'no error';
  };

  test('a good minority band is accepted; without one nothing changes', () => {
    expect(() => leg(minority)()).not.toThrow();
    expect(() => leg(undefined)()).not.toThrow();
  });

  test('missing, implausible and unknown fields', () => {
    expect(message(leg({ ...minority, mobility300: undefined }))).toMatch(/^material\.minority\.mobility300: mobility300 is required/);
    expect(message(leg({ ...minority, bandGap: 150 }))).toMatch(/^material\.minority\.bandGap: .*eV.*meV/);
    expect(message(leg({ ...minority, bandGap: -0.1 }))).toMatch(/^material\.minority\.bandGap: bandGap must be greater than 0/);
    expect(message(leg({ ...minority, bandGapSlope: 0.01 }))).toMatch(/^material\.minority\.bandGapSlope: .*eV\/K/);
    expect(message(leg({ ...minority, effectiveMass: 0 }))).toMatch(/^material\.minority\.effectiveMass: /);
    expect(message(leg({ ...minority, gap: 0.2 }))).toMatch(/^material\.minority\.gap: unknown field/);
    expect(message(leg(0.2))).toMatch(/^material\.minority: minority must be \{effectiveMass/);
  });

  test('a gap that closes below 300 K, or below the hot side, is refused', () => {
    expect(message(leg({ ...minority, bandGap: 0.02, bandGapSlope: 1e-4 }))).toMatch(/^material\.minority\.bandGapSlope: the gap Eg0 − β·T closes below 300 K/);
    expect(message(leg({ ...minority, bandGapSlope: 5e-4 }, { hotSide: 450 }))).toMatch(/^hotSide: 450 K is above 400 K, where the band gap/);
  });
});
