/**
 * Solve one leg: shoot for the unknown end condition, integrate once more
 * recording the profile, estimate the achieved accuracy by re-integrating at
 * a 100× tighter step tolerance, and check the energy balance
 * P = Qh − Qc against the independently integrated V·I.
 */
import { CaseError } from './case-error';
import { integrateLeg } from './integrate';
import type { Leg, LegSection } from './leg-profile';
import { figureOfMerit, type Properties } from './material-family';
import { legFluxScale, shootColdSide, shootHeatLoad, type Shot, type ShotOutcome } from './shoot';

export type LegProblem = {
  leg: Leg;
  /** Hot-side temperature [K], held by the heat sink. */
  hotSide: number;
  /** Current [A], magnitude in the cooling direction (J = sign(S)·I/A). */
  current: number;
  /** Heat drawn from the load [W]; give this or coldSide. */
  heatLoad?: number;
  /** Cold-side temperature [K]; give this or heatLoad. */
  coldSide?: number;
};

export type SolveOptions = {
  /**
   * Target relative accuracy of the unknown (Tc or the heat load).
   * @default 1e-9
   */
  tolerance?: number;
  /**
   * Number of equally spaced profile points (section boundaries are added).
   * @default 41
   */
  profilePoints?: number;
  /**
   * Re-integrate at a 100× tighter tolerance to estimate the achieved accuracy.
   * @default true
   */
  estimateError?: boolean;
};

export type LegProfile = {
  /** Position from the cold end [m]; an interface with a property jump appears twice. */
  x: number[];
  temperature: number[];
  seebeck: number[];
  sigma: number[];
  kappa: number[];
  zT: number[];
  /** Doping [cm⁻³] when a doping-controlled family is used. */
  perCm3?: number[];
};

export type LegSolution = {
  coldSide: number;
  hotSide: number;
  deltaT: number;
  current: number;
  /** Voltage across the leg in the driving direction [V] (V·I = electrical power). */
  voltage: number;
  /** Input power P = Qh − Qc [W]. */
  power: number;
  heatLoad: number;
  heatRejected: number;
  /** Qc / P; null when no power is drawn. */
  cop: number | null;
  profile: LegProfile;
  accuracy: {
    /** Which end condition was solved for. */
    unknown: 'coldSide' | 'heatLoad';
    /** Estimated relative error of that unknown (integration + root). */
    relativeError: number;
    tolerance: number;
    /** |(Qh − Qc) − V·I| / |P|: the energy-balance check. */
    energyBalance: number;
  };
  shots: number;
  /** Right-hand-side evaluations spent. */
  evaluations: number;
};

/** Internal: the optimiser's final solve allows a sliver beyond a table's range (see run-case.ts). */
export type RangeOptions = { rangeSlack?: number };

export type CheckedSolveOptions = Required<SolveOptions>;

export function checkSolveOptions(options: SolveOptions = {}): CheckedSolveOptions {
  const tolerance = options.tolerance ?? 1e-9;
  if (!(tolerance >= 1e-13 && tolerance <= 1e-3)) throw new CaseError('tolerance', 'must be between 1e-13 and 1e-3');
  const profilePoints = options.profilePoints ?? 41;
  if (!Number.isInteger(profilePoints) || profilePoints < 2 || profilePoints > 2001) throw new CaseError('profilePoints', 'must be an integer from 2 to 2001');
  return { tolerance, profilePoints, estimateError: options.estimateError ?? true };
}

/** The integrator's per-step tolerance for a target accuracy of the unknown (see solve-leg.test.ts). */
export function odeToleranceFor(tolerance: number): number {
  return tolerance / 10;
}

/** Shoot, throwing a CaseError that says why when there is no steady state. */
export function shootOrThrow(problem: LegProblem, tolerance: number, stepHint: { step: number }, rangeSlack?: number): Shot {
  const { leg, hotSide } = problem;
  const J = (leg.sign * problem.current) / leg.area;
  const settings = { tolerance, odeTolerance: odeToleranceFor(tolerance), stepHint, rangeSlack };
  const outcome: ShotOutcome =
    problem.coldSide !== undefined ? shootHeatLoad(leg, J, hotSide, problem.coldSide, settings) : shootColdSide(leg, J, hotSide, (problem.heatLoad ?? 0) / leg.area, settings);
  const family = leg.sections[0].family;
  if (!outcome.ok || !outcome.shot.converged) {
    const reached = outcome.ok ? outcome.shot.coldSide : outcome.temperature;
    const where = outcome.ok ? 'at the cold end' : `at x = ${(outcome.x * 1e3).toPrecision(4)} mm`;
    const tableField = family.kind === 'table' ? 'material.rows' : undefined;
    const low = outcome.ok ? outcome.shot.residual > 0 : outcome.reason === 'low';
    if (low) {
      const field = tableField ?? (problem.coldSide !== undefined ? 'coldSide' : 'heatLoad');
      throw new CaseError(
        field,
        `no steady state: the leg would need ${reached.toPrecision(5)} K ${where}, below the lowest temperature the material is defined at (${Math.max(family.minTemperature, 0)} K)`,
      );
    }
    const field = tableField ?? 'current';
    throw new CaseError(
      field,
      `no steady state: the leg would reach ${reached.toPrecision(5)} K ${where}, above the highest temperature the material is defined at (${family.maxTemperature} K)`,
    );
  }
  return outcome.shot;
}

const scratch: Properties = { seebeck: 0, sigma: 0, kappa: 0 };

function log10At(section: LegSection, x: number): number {
  const w = (x - section.start) / (section.end - section.start);
  return section.log10Start + w * (section.log10End - section.log10Start);
}

export function solveLegProblem(problem: LegProblem, options: SolveOptions & RangeOptions = {}): LegSolution {
  const o = checkSolveOptions({ tolerance: options.tolerance, profilePoints: options.profilePoints, estimateError: options.estimateError });
  const rangeSlack = options.rangeSlack;
  if ((problem.coldSide === undefined) === (problem.heatLoad === undefined)) {
    throw new CaseError('coldSide', 'give either the heat load or the cold-side temperature, not both and not neither');
  }
  const { leg, hotSide, current } = problem;
  const stepHint = { step: leg.length / 16 };
  const shot = shootOrThrow(problem, o.tolerance, stepHint, rangeSlack);
  const J = shot.currentDensity;

  // Recording pass at the root.
  const profile: LegProfile = { x: [], temperature: [], seebeck: [], sigma: [], kappa: [], zT: [], ...(leg.graded ? { perCm3: [] } : {}) };
  const stops = Array.from({ length: o.profilePoints }, (_, k) => (k * leg.length) / (o.profilePoints - 1));
  const odeTolerance = odeToleranceFor(o.tolerance);
  const fluxScale = legFluxScale(leg, hotSide, J);
  const record = integrateLeg(leg, J, shot.coldSide, shot.coldFlux, {
    tolerance: odeTolerance,
    fluxScale,
    stepHint,
    stops,
    rangeSlack,
    onPoint: (x, temperature, _flux, _voltage, section) => {
      const log10 = log10At(section, x);
      section.family.properties(log10, temperature, scratch);
      const last = profile.x.length - 1;
      // Continuous properties across a node: keep one point.
      if (last >= 0 && profile.x[last] === x && profile.seebeck[last] === scratch.seebeck && profile.sigma[last] === scratch.sigma && profile.kappa[last] === scratch.kappa) return;
      if (leg.graded && last >= 0 && profile.x[last] === x) return;
      profile.x.push(x);
      profile.temperature.push(temperature);
      profile.seebeck.push(scratch.seebeck);
      profile.sigma.push(scratch.sigma);
      profile.kappa.push(scratch.kappa);
      profile.zT.push(figureOfMerit(scratch, temperature));
      profile.perCm3?.push(Math.pow(10, log10));
    },
  });

  const unknown = problem.coldSide !== undefined ? 'heatLoad' : 'coldSide';
  const unknownValue = unknown === 'coldSide' ? shot.coldSide : shot.coldFlux;
  // The heat load may be ~0; measure its error against the flux scale then.
  const reference = Math.max(Math.abs(unknownValue), unknown === 'coldSide' ? 0 : 1e-2 * fluxScale);
  // Recording pass: same tolerance, stopped at the profile points, at the root itself.
  let gapError = Math.abs(record.temperature - hotSide);
  let evaluations = shot.evaluations + record.evaluations;
  if (o.estimateError) {
    // A 10× tighter integration has ~10× less error; the difference from ours
    // estimates our integration error in T(L).
    const fine = integrateLeg(leg, J, shot.coldSide, shot.coldFlux, { tolerance: odeTolerance / 10, fluxScale, stepHint: { step: stepHint.step }, rangeSlack });
    evaluations += fine.evaluations;
    gapError = Math.max(gapError, Math.abs(fine.temperature - record.temperature));
  }
  const relativeError = (shot.rootError + gapError / Math.abs(shot.slope)) / reference;

  const heatLoad = shot.coldFlux * leg.area;
  const heatRejected = record.flux * leg.area;
  // Qh − Qc also carries the parasitic heat the leg took up; the rest is V·I.
  const power = heatRejected - heatLoad - record.parasitic * leg.area;
  const voltage = leg.sign * record.voltage;
  const electrical = voltage * current;
  const energyBalance = Math.abs(power - electrical) / Math.max(Math.abs(power), Math.abs(electrical), 1e-300);
  return {
    coldSide: shot.coldSide,
    hotSide,
    deltaT: hotSide - shot.coldSide,
    current,
    voltage,
    power,
    heatLoad,
    heatRejected,
    cop: power > 0 ? heatLoad / power : null,
    profile,
    accuracy: { unknown, relativeError, tolerance: o.tolerance, energyBalance: power === 0 && electrical === 0 ? 0 : energyBalance },
    shots: shot.shots,
    evaluations,
  };
}
