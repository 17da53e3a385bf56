/**
 * One leg at one operating point: current I and both junction temperatures
 * (Tc, Th) given, the heat drawn at the cold junction, the heat rejected at
 * the hot one and the voltage across leg and contacts. One shooting solve for
 * the cold-end heat flux (T(L) = Th), then one integration at the root so
 * that Qh − Qc = V·I holds to the integrator's accuracy.
 */
import { integrateLeg } from './integrate';
import type { Leg } from './leg-profile';
import { legFluxScale, shootHeatLoad } from './shoot';
import { odeToleranceFor } from './solve-leg';

/** Junction-side heats [W] and voltage [V] of one leg (contacts included). */
export type LegPoint = { heatLoad: number; heatRejected: number; voltage: number };

/**
 * Carried between calls on one leg. A previous root is reused as the first
 * guess only when the new point is close to it (a far guess costs a wasted
 * full-accuracy integration; the closed-form guess is better then).
 */
export type LegPointWarm = {
  stepHint: { step: number };
  last?: { current: number; coldSide: number; hotSide: number; coldFlux: number; slope: number };
};

export function newLegPointWarm(leg: Leg): LegPointWarm {
  return { stepHint: { step: leg.length / 16 } };
}

/** A previous point counts as close within this relative change of the current and this many kelvin. */
const CLOSE_CURRENT = 1e-3;
const CLOSE_KELVIN = 0.05;
/**
 * Trials per phase: a leg with a steady state converges in 2–8; without one
 * (e.g. thermal runaway at a high current) the search would otherwise spend
 * up to 100 whole-leg integrations before giving up.
 */
const MAX_SHOTS = 15;
/** |T(L) − Th| at the last trial, relative to Th, above which the shot is no solution. */
const RESIDUAL_LIMIT = 1e-6;

/** The leg at current I [A] between junctions at Tc and Th [K]; undefined when it has no steady state there. */
export function legPointAt(leg: Leg, current: number, coldSide: number, hotSide: number, tolerance: number, warm: LegPointWarm): LegPoint | undefined {
  const J = (leg.sign * current) / leg.area;
  const odeTolerance = odeToleranceFor(tolerance);
  const last = warm.last;
  const close =
    last !== undefined &&
    Math.abs(current - last.current) <= CLOSE_CURRENT * Math.max(Math.abs(current), Math.abs(last.current)) &&
    Math.abs(coldSide - last.coldSide) <= CLOSE_KELVIN &&
    Math.abs(hotSide - last.hotSide) <= CLOSE_KELVIN;
  const out = shootHeatLoad(leg, J, hotSide, coldSide, {
    tolerance,
    odeTolerance,
    stepHint: warm.stepHint,
    maxShots: MAX_SHOTS,
    ...(close && last ? { guess: last.coldFlux, slope: last.slope } : {}),
  });
  // A root search can close its bracket on a jump of T(L) (a current at which
  // the leg runs away thermally on one side): that is no steady state either.
  if (!out.ok || !out.shot.converged || !(Math.abs(out.shot.residual) <= RESIDUAL_LIMIT * hotSide)) return undefined;
  const { coldFlux, slope } = out.shot;
  warm.last = { current, coldSide, hotSide, coldFlux, slope };
  const end = integrateLeg(leg, J, coldSide, coldFlux, { tolerance: odeTolerance, fluxScale: legFluxScale(leg, hotSide, J), stepHint: { step: warm.stepHint.step } });
  if (end.status !== 'ok') return undefined;
  return { heatLoad: coldFlux * leg.area, heatRejected: end.flux * leg.area, voltage: leg.sign * end.voltage };
}
