/**
 * Two test-only material families whose leg equations have closed-form
 * solutions, so the engine's own solver (shooting + Dormand–Prince) can be
 * checked against something it does not compute itself:
 *
 * - seebeckLinearInTemperature: S = b·T, σ and κ constant (Thomson
 *   coefficient τ = T·dS/dT = b·T, a nonlinear leg equation solved by Airy
 *   functions);
 * - seebeckLinearInPosition: S = S₀ + a·x, σ and κ constant (a graded leg,
 *   a linear equation solved by exponentials).
 *
 * The engine knows position only through the doping coordinate: inside a
 * section log10 n runs linearly from log10Start to log10End. Built with
 * positionLeg below, that coordinate is u = x/L exactly, and the
 * position family reads S from it. Both families call themselves 'table':
 * the solver treats every doping-controlled kind alike (the kind only names
 * the field of an error message), and these are no band model.
 */
import { gradedLeg, type Leg } from '../leg-profile';
import type { MaterialFamily } from '../material-family';

const RANGE = { minTemperature: 1, maxTemperature: 2000, minLog10Doping: -Infinity, maxLog10Doping: Infinity } as const;

/** S = b·T [V/K] (b in V/K²; negative b: n-type), constant σ [S/m] and κ [W/(m·K)]. */
export function seebeckLinearInTemperature(b: number, sigma: number, kappa: number): MaterialFamily {
  return {
    kind: 'table',
    sign: b < 0 ? -1 : 1,
    ...RANGE,
    properties(_u, temperature, out) {
      out.seebeck = b * temperature;
      out.sigma = sigma;
      out.kappa = kappa;
    },
  };
}

/**
 * S = S₀ + a·x along a leg of length L (x from the cold end, u = x/L the
 * doping coordinate of positionLeg), constant σ and κ.
 */
export function seebeckLinearInPosition(s0: number, a: number, length: number, sigma: number, kappa: number): MaterialFamily {
  return {
    kind: 'table',
    sign: s0 + a * length < 0 ? -1 : 1,
    ...RANGE,
    properties(u, _temperature, out) {
      out.seebeck = s0 + a * length * u;
      out.sigma = sigma;
      out.kappa = kappa;
    },
  };
}

/** One section from x = 0 to L whose doping coordinate runs from 0 to 1, i.e. u = x/L. */
export function positionLeg(length: number, area: number, family: MaterialFamily): Leg {
  return gradedLeg(length, area, family, [0, 1], [0, 1]);
}
