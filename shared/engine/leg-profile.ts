/**
 * A leg as the integrator sees it: consecutive sections from the cold end
 * (x = 0) to the hot end (x = L), each one family with log10 n linear in x.
 * Constant-property segments are sections of a constant family; a doping
 * profile piecewise-linear in log10 n gives one section per pair of nodes.
 * Inside a section the properties are smooth in x and T, so the integrator
 * restarts exactly at every section boundary (T and q are continuous there;
 * S, σ, κ or their slopes may jump).
 */
import type { LegEnds } from './leg-ends';
import { constantFamily, type MaterialFamily } from './material-family';

export type LegSection = {
  /** Section bounds [m], start < end. */
  start: number;
  end: number;
  family: MaterialFamily;
  /** log10(n / cm⁻³) at start and end, linear in between (ignored by constant families). */
  log10Start: number;
  log10End: number;
  /** Index of the input segment (segmented legs) or of the left doping node. */
  index: number;
};

export type Leg = {
  length: number;
  area: number;
  /** +1 p-type, −1 n-type: the cooling current density is J = sign·I/A. */
  sign: 1 | -1;
  sections: LegSection[];
  /** Whether a doping-controlled family is used (the profile then reports n). */
  graded: boolean;
  /**
   * Contacts (specific electrical contact resistivity of the cold and the
   * hot junction [Ω·m²]) and parasitic heat (a fixed load onto the cold
   * junction, radiation onto the sides); absent = ideal. Each junction adds
   * ρc/A to the leg's resistance and releases its Joule heat I²ρc/A where it
   * is (see integrate.ts and PHYSICS.md, "Contacts", "Parasitic heat").
   */
  ends?: LegEnds;
};

export type Segment = { fraction: number; seebeck: number; sigma: number; kappa: number };

/** Constant-property segments, cold end first; zero-length segments are dropped. */
export function segmentedLeg(length: number, area: number, segments: readonly Segment[]): Leg {
  const sections: LegSection[] = [];
  let start = 0;
  let cumulative = 0;
  segments.forEach((s, index) => {
    cumulative += s.fraction;
    // The last boundary is the hot end exactly, whatever rounding left over.
    const end = index === segments.length - 1 ? length : Math.min(length, cumulative * length);
    if (end > start) {
      sections.push({ start, end, family: constantFamily(s.seebeck, s.sigma, s.kappa), log10Start: 0, log10End: 0, index });
    }
    start = Math.max(start, end);
  });
  return { length, area, sign: segments[0].seebeck < 0 ? -1 : 1, sections, graded: false };
}

/**
 * A family with log10 n piecewise linear between nodes at fractions x of the
 * length (x[0] = 0, x[last] = 1, increasing).
 */
export function gradedLeg(length: number, area: number, family: MaterialFamily, x: readonly number[], log10Doping: readonly number[]): Leg {
  const sections: LegSection[] = [];
  if (x.length === 1) {
    sections.push({ start: 0, end: length, family, log10Start: log10Doping[0], log10End: log10Doping[0], index: 0 });
  }
  for (let k = 0; k + 1 < x.length; k++) {
    const start = x[k] * length;
    const end = k + 2 === x.length ? length : x[k + 1] * length;
    if (end > start) {
      sections.push({ start, end, family, log10Start: log10Doping[k], log10End: log10Doping[k + 1], index: k });
    }
  }
  return { length, area, sign: family.sign, sections, graded: family.kind !== 'constant' };
}

/** The same doping everywhere. */
export function uniformLeg(length: number, area: number, family: MaterialFamily, log10Doping: number): Leg {
  return gradedLeg(length, area, family, [0, 1], [log10Doping, log10Doping]);
}

/** Equally spaced node fractions, both ends included. */
export function equallySpacedNodes(count: number): number[] {
  if (count === 1) return [0];
  return Array.from({ length: count }, (_, k) => k / (count - 1));
}

/** log10 n at a fraction of the length on a piecewise-linear profile. */
export function profileAt(x: readonly number[], log10Doping: readonly number[], fraction: number): number {
  if (x.length === 1 || fraction <= x[0]) return log10Doping[0];
  for (let k = 0; k + 1 < x.length; k++) {
    if (fraction <= x[k + 1]) {
      const w = (fraction - x[k]) / (x[k + 1] - x[k]);
      return log10Doping[k] + w * (log10Doping[k + 1] - log10Doping[k]);
    }
  }
  return log10Doping[log10Doping.length - 1];
}

/** The same leg with its contacts and parasitic heat (undefined = ideal, the leg itself). */
export function withEnds(leg: Leg, ends: LegEnds | undefined): Leg {
  if (!ends) return leg;
  return { ...leg, ends };
}
