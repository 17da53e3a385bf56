/**
 * What `leg couple FILE` prints, and a couple run's result: the checked case
 * in, the optimised (or, with nothing free, evaluated) couple out — its
 * operating point, each leg as a `curves`/`module` leg ready for a cascade
 * stage, and the mismatch between each leg's own best current and the
 * shared one. Pure; time is read only to report `seconds`.
 */
import { CaseError } from './case-error';
import type { CheckedCoupleCase, CoupleLegCase } from './couple-case';
import { mismatchOf } from './couple-mismatch';
import type { LegDefinitionInput } from './device-case';
import type { Objective } from './evaluate-design';
import type { Leg } from './leg-profile';
import { coupleConditions, optimizeCouple, type CoupleRunOptions } from './optimize-couple';
import { checkSolveOptions } from './solve-leg';

export type CoupleLegResult = {
  /** m, m² */
  length: number;
  area: number;
  /** The leg's profile (null for segments or a constant material). */
  doping: { x: number[]; perCm3: number[] } | null;
  /** Profile optimised (true) or fixed (false). */
  optimised: boolean;
  /** Shared current / area [A/m²]. */
  currentDensity: number;
  /** This leg's own best current density [A/m²] (see PHYSICS.md, "Matched couples"). */
  ownCurrentDensity: number;
  /** The leg as a `curves`/`module` leg (feed it to a cascade stage). */
  leg: LegDefinitionInput;
};

export type CoupleResult = {
  hotSide: number;
  coldSide: number;
  deltaT: number;
  /** W per couple, drawn from the load. */
  heatLoad: number;
  current: number;
  voltage: number;
  power: number;
  cop: number | null;
  /** A_n / A_p used. */
  areaRatio: number;
  objective: { kind: Objective; value: number };
  p: CoupleLegResult;
  n: CoupleLegResult;
  mismatch: { separateObjective: number; cost: number; unit: 'K' | 'W' | '' };
  evaluations: number;
  seconds: number;
};

export type CoupleOptions = CoupleRunOptions & {
  /** Milliseconds clock, for `seconds` only. */
  now?: () => number;
};

const clock = (): number => (typeof performance !== 'undefined' ? performance.now() : Date.now());

function legResult(l: CoupleLegCase, leg: Leg, log10: number[] | null, x: number[] | null, current: number, ownCurrent: number): CoupleLegResult {
  const given = l.leg.kind === 'family' && l.leg.family.kind !== 'constant' ? l.leg.doping : undefined;
  const doping = log10 && x ? { x, perCm3: log10.map((v) => 10 ** v) } : given ? { x: [...given.x], perCm3: given.log10.map((v) => 10 ** v) } : null;
  return {
    length: leg.length,
    area: leg.area,
    doping,
    optimised: l.profile !== undefined,
    currentDensity: current / leg.area,
    ownCurrentDensity: ownCurrent / leg.area,
    leg: { length: leg.length, area: leg.area, ...l.fields, ...(doping && l.fields.material ? { doping } : {}) },
  };
}

/** Optimise (or, with nothing free, evaluate) a checked couple case. */
export function runCouple(c: CheckedCoupleCase, options: CoupleOptions = {}): CoupleResult {
  const now = options.now ?? clock;
  const t0 = now();
  const { tolerance } = checkSolveOptions({ tolerance: options.tolerance });
  const counter = { evaluations: 0 };
  const opt = optimizeCouple(c, counter, { ...options, tolerance });
  const point = opt.score.point;
  if (!opt.score.feasible || !point) {
    throw new CaseError(
      c.objective === 'maxCop' ? 'heatLoad' : c.objective === 'maxHeatLoad' ? 'coldSide' : 'hotSide',
      c.objective === 'maxCop' ? 'no design of this couple carries this heat load at this cold side: lower heatLoad or raise coldSide' : 'no design of this couple has a steady state for these conditions',
    );
  }
  const conditions = coupleConditions(c);
  const m = mismatchOf(opt.p, opt.n, point, opt.score.value, conditions, tolerance, counter);
  return {
    hotSide: c.hotSide,
    coldSide: point.coldJunction,
    deltaT: c.hotSide - point.coldJunction,
    heatLoad: point.heatLoad,
    current: point.current,
    voltage: point.voltage,
    power: point.power,
    cop: point.cop,
    areaRatio: opt.n.area / opt.p.area,
    objective: { kind: c.objective, value: opt.score.value },
    p: legResult(c.p, opt.p, opt.state.p, opt.x.p, point.current, m.ownCurrent.p),
    n: legResult(c.n, opt.n, opt.state.n, opt.x.n, point.current, m.ownCurrent.n),
    mismatch: { separateObjective: m.separateObjective, cost: m.cost, unit: m.unit },
    evaluations: counter.evaluations,
    seconds: (now() - t0) / 1000,
  };
}
