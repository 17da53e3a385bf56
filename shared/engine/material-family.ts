/**
 * What the solver asks of a material: S, σ, κ at a doping and a temperature.
 * Every family (constant, measured table, band model) implements this, so the
 * leg integrator has one code path for segments and graded legs alike.
 */

/** Local transport properties, SI: S [V/K], σ [S/m], κ [W/(m·K)]. */
export type Properties = { seebeck: number; sigma: number; kappa: number };

export type MaterialFamily = {
  readonly kind: 'constant' | 'table' | 'band';
  /** +1 for p-type (S > 0), −1 for n-type (S < 0). */
  readonly sign: 1 | -1;
  /** Temperatures the family is defined at [K]; the solver stays inside. */
  readonly minTemperature: number;
  readonly maxTemperature: number;
  /** Doping range the family is defined at, log10(n / cm⁻³). */
  readonly minLog10Doping: number;
  readonly maxLog10Doping: number;
  /**
   * Writes S, σ, κ at log10(n / cm⁻³) and T [K] into out. Called in the
   * integrator's inner loop: must not allocate.
   */
  properties(log10Doping: number, temperature: number, out: Properties): void;
  /**
   * Two-band families only: the share of the electrical conductivity (so of
   * the current) that minority carriers carry, σ_minority/σ, at
   * log10(n / cm⁻³) and T — where bipolar conduction sets in.
   */
  minorityShare?(log10Doping: number, temperature: number): number;
};

/** Dimensionless figure of merit zT = S²σT/κ. */
export function figureOfMerit(p: Properties, temperature: number): number {
  return (p.seebeck * p.seebeck * p.sigma * temperature) / p.kappa;
}

/** A material whose properties depend on neither doping nor temperature. */
export function constantFamily(seebeck: number, sigma: number, kappa: number): MaterialFamily {
  return {
    kind: 'constant',
    sign: seebeck < 0 ? -1 : 1,
    minTemperature: 0,
    maxTemperature: Infinity,
    minLog10Doping: -Infinity,
    maxLog10Doping: Infinity,
    properties(_log10Doping, _temperature, out) {
      out.seebeck = seebeck;
      out.sigma = sigma;
      out.kappa = kappa;
    },
  };
}
