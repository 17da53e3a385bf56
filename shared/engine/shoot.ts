/**
 * The two-point problem by shooting. The state is known at the cold end up
 * to one unknown (Tc when the heat load is given, the heat load when Tc is
 * given, or the current when both are given); the hot-end condition
 * T(L) = Th fixes it. Each trial integrates the whole leg; the root is found
 * by secant steps then Brent's method, starting from the closed-form
 * constant-property estimate (or from the caller's warm start).
 */
import { secantThenBrent } from './find-root';
import { integrateLeg, type IntegrationResult } from './integrate';
import { coldJump, radiationTerm } from './leg-ends';
import type { Leg } from './leg-profile';
import type { Properties } from './material-family';

/** Length-averaged S, resistivity and thermal resistivity of a leg at one temperature. */
export type LegAverages = { seebeck: number; resistivity: number; kappa: number };

const scratch: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
/** Simpson's rule along a section: good enough for a starting guess. */
const SIMPSON: readonly (readonly [number, number])[] = [
  [0, 1 / 6],
  [0.5, 4 / 6],
  [1, 1 / 6],
];

export function legAverages(leg: Leg, temperature: number): LegAverages {
  let s = 0;
  let rho = 0;
  let w = 0;
  for (const section of leg.sections) {
    const len = section.end - section.start;
    const t = Math.min(section.family.maxTemperature, Math.max(section.family.minTemperature, temperature));
    for (const [f, weight] of SIMPSON) {
      section.family.properties(section.log10Start + f * (section.log10End - section.log10Start), t, scratch);
      s += weight * len * scratch.seebeck;
      rho += (weight * len) / scratch.sigma;
      w += (weight * len) / scratch.kappa;
    }
  }
  return { seebeck: s / leg.length, resistivity: rho / leg.length, kappa: leg.length / w };
}

/** Everything a converged shot knows. */
export type Shot = {
  coldSide: number;
  /** Heat flux density at the cold end [W/m²] (heat load / area). */
  coldFlux: number;
  /** At the last trial, within the tolerance of the root. */
  hotFlux: number;
  /** Voltage along +x for the signed current density, at the last trial. */
  voltage: number;
  /** Parasitic heat taken up per unit area at the last trial [W/m²] (see integrate.ts): power = (hotFlux − coldFlux − parasitic)·A. */
  parasitic: number;
  currentDensity: number;
  /** d T(L) / d(unknown) at the root, for warm starts and error estimates. */
  slope: number;
  /** T(L) − Th at the last trial. */
  residual: number;
  /** Bound on the root's error in the unknown's units (the last correction applied). */
  rootError: number;
  /** False when no root was found inside the material's range (then residual's sign says which way it lies). */
  converged: boolean;
  shots: number;
  evaluations: number;
};

export type ShotSettings = {
  /** Relative tolerance of the unknown. */
  tolerance: number;
  /** Integrator tolerance per step. */
  odeTolerance: number;
  stepHint: { step: number };
  /** Relative slack on the material's temperature range (see IntegrationOptions). */
  rangeSlack?: number;
  /** Warm start: a previous root and slope (the coarse phase is skipped when it is close). */
  guess?: number;
  slope?: number;
  /**
   * Trials allowed in each phase before the search gives up (not converged).
   * A solvable leg needs a handful; callers that probe currents with no
   * steady state (operating curves) cap this to fail fast — and then a
   * coarse phase that finds no root ends the search at once.
   * @default 100
   */
  maxShots?: number;
};

/** Outcome of a root search, or the reason there is none. */
export type ShotOutcome = { ok: true; shot: Shot } | { ok: false; reason: 'low' | 'high'; x: number; temperature: number; shots: number; evaluations: number };

/** Coarse phase: loose enough for a few steps per section, tight enough for a good slope. */
const COARSE_ODE_TOLERANCE = 1e-6;
const COARSE_ROOT_TOLERANCE = 1e-5;
/** A warm start whose first correction is below this (relative) skips the coarse phase. */
const WARM_START_REACH = 1e-4;

type Unknown = {
  /** Integrate the leg for a trial value of the unknown. */
  run: (x: number, odeTolerance: number, stepHint: { step: number }) => IntegrationResult;
  guess: number;
  slope: number;
  lower: number;
  upper: number;
  /** Absolute tolerance on the unknown at the requested relative accuracy. */
  scale: number;
};

function gapOf(result: IntegrationResult, hotSide: number): number {
  if (result.status === 'low') return -Infinity;
  if (result.status === 'high') return Infinity;
  return result.temperature - hotSide;
}

/**
 * Two phases: a coarse shooting (loose integration) lands within ~1e-6 of the
 * root and measures the slope; the fine phase then needs one or two Newton
 * steps at full accuracy. A warm start close to the root skips the coarse
 * phase.
 */
function solveUnknown(
  u: Unknown,
  hotSide: number,
  settings: ShotSettings,
): { root: number; slope: number; rootError: number; converged: boolean; last: IntegrationResult; shots: number; evaluations: number } {
  let shots = 0;
  let evaluations = 0;
  let last: IntegrationResult | undefined;
  const trial = (odeTolerance: number, hint: { step: number }) => (x: number) => {
    last = u.run(x, odeTolerance, hint);
    shots++;
    evaluations += last.evaluations;
    return gapOf(last, hotSide);
  };
  let guess = settings.guess ?? u.guess;
  let slope = settings.slope ?? u.slope;
  let coarseFailed = false;
  const coarse = () => {
    const r = secantThenBrent(trial(COARSE_ODE_TOLERANCE, { step: settings.stepHint.step }), guess, slope, u.lower, u.upper, COARSE_ROOT_TOLERANCE * u.scale, settings.maxShots);
    guess = r.root;
    slope = r.slope;
    coarseFailed = !r.converged;
  };
  if (settings.odeTolerance < COARSE_ODE_TOLERANCE) {
    if (settings.guess === undefined) coarse();
    else {
      // A warm start close to the root goes straight to full accuracy; a far
      // one (after a long optimiser step) is cheaper to approach coarsely.
      const g0 = trial(settings.odeTolerance, settings.stepHint)(guess);
      if (Number.isFinite(g0) && Math.abs(g0 / slope) <= WARM_START_REACH * u.scale) guess -= g0 / slope;
      else coarse();
    }
  }
  // With capped shots (fail fast), a coarse phase that found no root ends the search.
  if (coarseFailed && settings.maxShots !== undefined) {
    const result = last as IntegrationResult;
    return { root: guess, slope, rootError: 0, converged: false, last: result, shots, evaluations };
  }
  const fine = secantThenBrent(trial(settings.odeTolerance, settings.stepHint), guess, slope, u.lower, u.upper, settings.tolerance * u.scale, settings.maxShots);
  const result = last as IntegrationResult;
  return { root: fine.root, slope: fine.slope, rootError: fine.extrapolated ? Math.abs(fine.value / fine.slope) : 0, converged: fine.converged, last: result, shots, evaluations };
}

function outcome(r: ReturnType<typeof solveUnknown>, hotSide: number, build: (root: number) => Pick<Shot, 'coldSide' | 'coldFlux'>, J: number): ShotOutcome {
  if (r.last.status !== 'ok') return { ok: false, reason: r.last.status, x: r.last.x, temperature: r.last.temperature, shots: r.shots, evaluations: r.evaluations };
  return {
    ok: true,
    shot: {
      ...build(r.root),
      hotFlux: r.last.flux,
      voltage: r.last.voltage,
      parasitic: r.last.parasitic,
      currentDensity: J,
      slope: r.slope,
      residual: r.last.temperature - hotSide,
      rootError: r.rootError,
      converged: r.converged,
      shots: r.shots,
      evaluations: r.evaluations,
    },
  };
}

/** Radiation onto the sides per unit volume [W/m³] at one temperature (0 without radiation): for the closed-form guesses. */
function radiationSource(leg: Leg, temperature: number): number {
  const { coefficient, ts4 } = radiationTerm(leg.ends, leg.area);
  return coefficient === 0 ? 0 : coefficient * (ts4 - temperature ** 4);
}

/** Flux scale [W/m²] for q's error weight: conduction across the leg plus Peltier flux. */
export function legFluxScale(leg: Leg, hotSide: number, currentDensity: number, averages?: LegAverages): number {
  const avg = averages ?? legAverages(leg, hotSide);
  return (avg.kappa * hotSide) / leg.length + Math.abs(avg.seebeck * hotSide * currentDensity);
}

/** Unknown Tc for a given heat load (cold flux = heat load / area). */
export function shootColdSide(leg: Leg, currentDensity: number, hotSide: number, coldFlux: number, settings: ShotSettings): ShotOutcome {
  const L = leg.length;
  const J = currentDensity;
  // Constant properties: T(L) = Tc·(1 + a) − b exactly (see PHYSICS.md).
  // Properties averaged at Th first, then again at the mean temperature.
  // Contacts and a fixed parasitic load: the flux entering the leg includes
  // the cold contact's Joule heat and that load; radiation onto the sides
  // enters like extra Joule heat, taken at the temperature of the averages.
  const legFlux = coldFlux + coldJump(leg.ends, leg.area, J);
  const estimate = (avg: LegAverages, temperature: number) => {
    const a = (avg.seebeck * J * L) / avg.kappa;
    const b = (legFlux * L) / avg.kappa + ((J * J * avg.resistivity + radiationSource(leg, temperature)) * L * L) / (2 * avg.kappa);
    return { a, tc: (hotSide + b) / (1 + a) };
  };
  const atHot = legAverages(leg, hotSide);
  const first = estimate(atHot, hotSide);
  const mean = 0.5 * (first.tc + hotSide);
  const { a, tc } = settings.guess === undefined && Number.isFinite(first.tc) && first.tc > 0 ? estimate(legAverages(leg, mean), mean) : first;
  const family = leg.sections[0].family;
  const fluxScale = legFluxScale(leg, hotSide, J, atHot);
  const r = solveUnknown(
    {
      run: (tc, tolerance, stepHint) => integrateLeg(leg, J, tc, coldFlux, { tolerance, fluxScale, stepHint, rangeSlack: settings.rangeSlack }),
      guess: tc,
      slope: 1 + a > 0 ? 1 + a : 1,
      lower: Math.max(family.minTemperature, 1e-3) * (1 - (settings.rangeSlack ?? 0)),
      upper: Number.isFinite(family.maxTemperature) ? family.maxTemperature : 50 * hotSide,
      scale: hotSide,
    },
    hotSide,
    settings,
  );
  return outcome(r, hotSide, (root) => ({ coldSide: root, coldFlux }), J);
}

/** Unknown heat load for a given Tc. */
export function shootHeatLoad(leg: Leg, currentDensity: number, hotSide: number, coldSide: number, settings: ShotSettings): ShotOutcome {
  const avg = legAverages(leg, 0.5 * (hotSide + coldSide));
  const L = leg.length;
  const J = currentDensity;
  const a = (avg.seebeck * J * L) / avg.kappa;
  const fluxScale = legFluxScale(leg, hotSide, J);
  const source = radiationSource(leg, 0.5 * (hotSide + coldSide));
  const guess = (avg.kappa * (coldSide * (1 + a) - hotSide) - 0.5 * (J * J * avg.resistivity + source) * L * L) / L - coldJump(leg.ends, leg.area, J);
  // The flux scale bounds any physical heat flux by orders of magnitude.
  const bound = 1e3 * fluxScale + Math.abs(guess);
  const r = solveUnknown(
    {
      run: (flux, tolerance, stepHint) => integrateLeg(leg, J, coldSide, flux, { tolerance, fluxScale, stepHint, rangeSlack: settings.rangeSlack }),
      guess,
      slope: -L / avg.kappa,
      lower: -bound,
      upper: bound,
      // The heat load can be ~0 at the edge of the useful range: measure it against the flux scale.
      scale: 1e-2 * fluxScale,
    },
    hotSide,
    settings,
  );
  return outcome(r, hotSide, (root) => ({ coldSide, coldFlux: root }), J);
}
