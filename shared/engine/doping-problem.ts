/**
 * The doping optimisation as the optimisers see it: a family, a leg's
 * geometry, the end conditions and objective, the doping bounds, the node
 * layout, and whether the current is fixed.
 */
import type { Conditions } from './evaluate-design';
import type { LegEnds } from './leg-ends';
import { equallySpacedNodes, gradedLeg, withEnds, type Leg } from './leg-profile';
import type { MaterialFamily } from './material-family';

export type DopingProblem = {
  family: MaterialFamily;
  length: number;
  area: number;
  conditions: Conditions;
  /** Doping bounds, log10(n / cm⁻³). */
  lower: number;
  upper: number;
  /** Equally spaced doping nodes, both ends included. */
  controlPoints: number;
  monotone: boolean;
  /** Fixed current [A]; undefined when the current is free. */
  current?: number;
  /** Relative accuracy of each solve. */
  tolerance: number;
  /** Contacts of each junction and parasitic heat; absent = ideal. */
  ends?: LegEnds;
};

/** Counts leg solves across every phase of a run. */
export type Counter = { evaluations: number };

export function nodeFractions(problem: DopingProblem): number[] {
  return equallySpacedNodes(problem.controlPoints);
}

export function legFor(problem: DopingProblem, x: readonly number[], log10: readonly number[]): Leg {
  return withEnds(gradedLeg(problem.length, problem.area, problem.family, x, log10), problem.ends);
}

/** Whether the current is an optimisation variable (free, and not fixed by maxCop's conditions). */
export function currentIsFree(problem: DopingProblem): boolean {
  return problem.current === undefined && problem.conditions.objective !== 'maxCop';
}
