import type { Leg, LegSection } from '../engine/leg-profile';
import type { MaterialFamily } from '../engine/material-family';

/** K constant-doping zones, cold end first: what a crystal grower can make. */
export type ZoneLayout = {
  /** Zone lengths as fractions of the leg, summing to 1. */
  fractions: number[];
  /** Doping of each zone, log10(n / cm⁻³). */
  log10: number[];
};

/** The zones as the integrator's sections (constant doping inside, a jump at each boundary). */
export function zonedLeg(length: number, area: number, family: MaterialFamily, z: ZoneLayout): Leg {
  const sections: LegSection[] = [];
  let start = 0;
  let cumulative = 0;
  z.fractions.forEach((f, index) => {
    cumulative += f;
    const end = index === z.fractions.length - 1 ? length : Math.min(length, cumulative * length);
    if (end > start) sections.push({ start, end, family, log10Start: z.log10[index]!, log10End: z.log10[index]!, index });
    start = Math.max(start, end);
  });
  return { length, area, sign: family.sign, sections, graded: true };
}

/**
 * Zone fractions from unconstrained variables u (K−1 of them), each zone at
 * least `minFraction` long: f_k = m + (1 − K·m)·w_k/Σw with w = (e^u, 1).
 * The optimiser then needs only box bounds.
 */
export function fractionsFrom(u: readonly number[], minFraction: number): number[] {
  const w = [...u.map(Math.exp), 1];
  const sum = w.reduce((a, b) => a + b, 0);
  const free = 1 - w.length * minFraction;
  return w.map((wk) => minFraction + (free * wk) / sum);
}

/** The inverse of fractionsFrom (zones exactly at the minimum are nudged just above it). */
export function variablesFrom(fractions: readonly number[], minFraction: number): number[] {
  const free = 1 - fractions.length * minFraction;
  const w = fractions.map((f) => Math.max(1e-9, (f - minFraction) / Math.max(free, 1e-12)));
  const last = w[w.length - 1]!;
  return w.slice(0, -1).map((wk) => Math.log(wk / last));
}
