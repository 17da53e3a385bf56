import type { DopingProblem } from '../engine/doping-problem';
import type { DesignScore } from '../engine/evaluate-design';
import { scoreLayout } from './zoning';
import type { ZoneLayout } from './zoned-leg';

/** Step in log10 n for the finite-difference derivatives (a 4.7 % change of doping). */
const STEP = 0.02;
/** Step for the mixed second derivatives: larger, so the solver's 1e-8 noise stays far below the cross terms. */
const MIXED_STEP = 0.05;
/** Up to this many zones every corner of the box is re-solved (2^6 = 64 solves per trial scale). */
export const ALL_CORNERS_UP_TO = 6;
/** Beyond that: the sign-guided corner plus this many of the quadratic model's worst corners. */
const MODEL_CORNERS = 31;
/** The common scale is bisected until its bracket is this narrow (0.5 % of each band). */
const SCALE_RESOLUTION = 0.005;

export type ZoneTolerance = {
  zone: number;
  /** Target and the band within which the loss stays under the budget, cm⁻³. */
  perCm3: number;
  lowPerCm3: number;
  highPerCm3: number;
  /** True when the band reaches the family's doping bound before the budget is lost. */
  lowAtBound: boolean;
  highAtBound: boolean;
  /** d(objective)/d log10 n and its second derivative, from the model. */
  slope: number;
  curvature: number;
  /** The loss computed by re-solving the leg at each band edge with every other zone on target (objective units). */
  lossAtLow: number;
  lossAtHigh: number;
};

/** How the bands of one zoning were made to hold for the whole leg. */
export type JointBandCheck = {
  /**
   * 'all-corners': every one of the 2^K corners re-solved; 'guided-corners' (K > 6): the sign-guided corner, the
   * quadratic model's 31 worst at the final scale, and a climb from the worst found to neighbouring corners.
   */
  method: 'all-corners' | 'guided-corners';
  /** The one-zone-at-a-time bands were shrunk towards the targets by this common factor (1 = they already held jointly). */
  scale: number;
  /** Corners re-solved at the final bands. */
  cornersSolved: number;
  /** The largest loss among them (objective units), ≤ the budget. */
  worstCornerLoss: number;
  /** The worst corner loss of the one-zone-at-a-time bands, before shrinking: what the old sheet promised. */
  perZoneWorstCornerLoss: number;
};

export type JointBands = { tolerances: ZoneTolerance[]; check: JointBandCheck; evaluations: number };

type Edge = { log10: number; atBound: boolean; loss: number };

/** A layout with the zone dopings replaced. */
const at = (layout: ZoneLayout, log10: readonly number[]): ZoneLayout => ({ ...layout, log10: [...log10] });

/**
 * Per zone, the doping band within which the objective loses at most
 * `budget` (K for ΔT), ONE ZONE AT A TIME, all else — including the current,
 * as a cooler is run at its set current — held at the design. The quadratic
 * model from the derivatives gives a first guess; each edge is then found by
 * re-solving the leg (bisection). These bands are only the starting point of
 * `jointZoneBands`: with several zones off target at once they do not hold.
 */
export function zoneTolerancesOneAtATime(p: DopingProblem, layout: ZoneLayout, score: DesignScore, budget: number, counter = { evaluations: 0 }): ZoneTolerance[] {
  const value = (k: number, log10: number): number => {
    counter.evaluations += 1;
    const s = scoreLayout(p, at(layout, layout.log10.map((v, i) => (i === k ? log10 : v))), score.current);
    return s.feasible ? s.value : -Infinity;
  };
  return layout.log10.map((y, k) => {
    const up = value(k, y + STEP);
    const down = value(k, y - STEP);
    const slope = (up - down) / (2 * STEP);
    const curvature = (up - 2 * score.value + down) / (STEP * STEP);
    const edge = (direction: 1 | -1): Edge => {
      const limit = direction > 0 ? p.upper : p.lower;
      const loss = (d: number): number => score.value - value(k, y + direction * d);
      const room = Math.abs(limit - y);
      if (room <= 1e-12 || loss(room) <= budget) return { log10: limit, atBound: true, loss: room <= 1e-12 ? 0 : loss(room) };
      // Quadratic guess for where the loss reaches the budget, then bisection on the solved loss.
      const a = 0.5 * Math.abs(curvature);
      const b = direction * -slope;
      const guess = a > 1e-12 ? (-b + Math.sqrt(Math.max(0, b * b + 4 * a * budget))) / (2 * a) : budget / Math.max(Math.abs(slope), 1e-12);
      let inside = 0;
      let outside = room;
      const g = Math.min(room, Math.max(1e-4, guess));
      if (loss(g) <= budget) inside = g; else outside = g;
      for (let i = 0; i < 30 && outside - inside > 1e-4; i += 1) {
        const mid = 0.5 * (inside + outside);
        if (loss(mid) <= budget) inside = mid; else outside = mid;
      }
      return { log10: y + direction * inside, atBound: false, loss: loss(inside) };
    };
    const low = edge(-1);
    const high = edge(1);
    return {
      zone: k, perCm3: 10 ** y, lowPerCm3: 10 ** low.log10, highPerCm3: 10 ** high.log10, lowAtBound: low.atBound, highAtBound: high.atBound,
      slope, curvature, lossAtLow: low.loss, lossAtHigh: high.loss,
    };
  });
}

/** Every corner of a K-box as bit masks (bit k set: zone k at its high edge). */
function allCorners(k: number): number[] {
  return Array.from({ length: 2 ** k }, (_, m) => m);
}

/**
 * Corners worth re-solving when 2^K is too many, at one trial scale: the
 * sign-guided corner (each zone at the edge where its own quadratic loss is
 * larger — the sign of the slope decides, the curvature weighs the band's
 * asymmetry) and the quadratic model's worst corners at that scale, which add
 * what the cross terms couple. Ranked afresh at every scale: linear terms
 * grow as s and quadratic ones as s², so the worst corner of the full bands
 * need not be the worst of the shrunk ones. The model is cheap (no solve), so
 * it ranks every corner.
 */
function modelCorners(k: number, modelLoss: (mask: number) => number, edgeModel: (zone: number, high: boolean) => number): number[] {
  let guided = 0;
  for (let z = 0; z < k; z += 1) if (edgeModel(z, true) > edgeModel(z, false)) guided |= 1 << z;
  const ranked = allCorners(k).sort((a, b) => modelLoss(b) - modelLoss(a)).slice(0, MODEL_CORNERS);
  return [guided, ...ranked.filter((m) => m !== guided)];
}

/**
 * Tolerance bands that hold for the whole leg: any combination of zone
 * dopings inside their bands loses at most `budget`.
 *
 * Why corners: at the zoning's optimum the loss is, to second order, a convex
 * quadratic in the zone dopings (the objective is at a maximum), so over a
 * box it is largest at a corner; the loss is re-solved there rather than
 * trusted to the model, and the tests re-solve random interior points too.
 *
 * How: start from the one-zone-at-a-time bands (their shape carries each
 * zone's own sensitivity and asymmetry), then shrink every band towards its
 * target by one common factor s, bisected on the re-solved worst corner
 * until it is ≤ budget. The quadratic model (slopes, and the full Hessian by
 * mixed differences) gives the first guess for s and the order in which
 * corners are tried, so a failing scale is usually rejected at its first
 * corner. Up to 6 zones all 2^K corners are re-solved at every trial; beyond,
 * the sign-guided corner and the model's 31 worst at that scale (see
 * modelCorners), then a climb over neighbouring corners from the worst one.
 */
export function jointZoneBands(p: DopingProblem, layout: ZoneLayout, score: DesignScore, budget: number): JointBands {
  const counter = { evaluations: 0 };
  const solve = (log10: readonly number[]): number => {
    counter.evaluations += 1;
    const s = scoreLayout(p, at(layout, log10), score.current);
    return s.feasible ? s.value : -Infinity;
  };
  const single = zoneTolerancesOneAtATime(p, layout, score, budget, counter);
  const k = layout.log10.length;
  const y = layout.log10;
  const low = single.map((t, z) => Math.log10(t.lowPerCm3) - y[z]!); // ≤ 0
  const high = single.map((t, z) => Math.log10(t.highPerCm3) - y[z]!); // ≥ 0
  // Quadratic model: Hessian with the diagonal from the bands' curvatures, cross terms by mixed differences.
  const hessian = single.map(() => single.map(() => 0));
  for (let i = 0; i < k; i += 1) {
    hessian[i]![i] = single[i]!.curvature;
    for (let j = i + 1; j < k; j += 1) {
      const f = (si: number, sj: number): number => solve(y.map((v, z) => v + (z === i ? si : z === j ? sj : 0) * MIXED_STEP));
      const mixed = (f(1, 1) - f(1, -1) - f(-1, 1) + f(-1, -1)) / (4 * MIXED_STEP * MIXED_STEP);
      hessian[i]![j] = mixed;
      hessian[j]![i] = mixed;
    }
  }
  const offset = (mask: number, z: number): number => ((mask >> z) & 1 ? high[z]! : low[z]!);
  const modelLoss = (mask: number, s = 1): number => {
    let gain = 0;
    for (let i = 0; i < k; i += 1) {
      const di = s * offset(mask, i);
      gain += single[i]!.slope * di;
      for (let j = 0; j < k; j += 1) gain += 0.5 * hessian[i]![j]! * di * s * offset(mask, j);
    }
    return -gain;
  };
  const edgeModel = (s: number) => (z: number, isHigh: boolean): number => {
    const d = s * (isHigh ? high[z]! : low[z]!);
    return -(single[z]!.slope * d + 0.5 * single[z]!.curvature * d * d);
  };
  const method: JointBandCheck['method'] = k <= ALL_CORNERS_UP_TO ? 'all-corners' : 'guided-corners';
  /** The corners tried at scale s, worst first by the model: a scale that fails usually fails at the first one. */
  const cornersAt = (s: number): number[] =>
    (method === 'all-corners' ? allCorners(k) : modelCorners(k, (m) => modelLoss(m, s), edgeModel(s))).sort((a, b) => modelLoss(b, s) - modelLoss(a, s));
  const cornerPoint = (mask: number, s: number): number[] => y.map((v, z) => v + s * offset(mask, z));
  let solvedAtLast = 0;
  /**
   * The re-solved worst corner at scale s; stops at the first corner over the
   * budget unless `all`. Without every corner, a climb from the worst one
   * found (flip one zone to its other edge while that loses more) catches
   * what the model mis-ranked.
   */
  const worstAt = (s: number, all: boolean): number => {
    const tried = new Map<number, number>();
    const lossOf = (m: number): number => {
      let l = tried.get(m);
      if (l === undefined) { l = score.value - solve(cornerPoint(m, s)); tried.set(m, l); }
      return l;
    };
    let worst = -Infinity;
    let worstMask = 0;
    for (const m of cornersAt(s)) {
      const loss = lossOf(m);
      if (loss > worst) { worst = loss; worstMask = m; }
      if (!all && loss > budget) return worst;
    }
    for (let improved = method === 'guided-corners'; improved;) {
      improved = false;
      for (let z = 0; z < k; z += 1) {
        const m = worstMask ^ (1 << z);
        const loss = lossOf(m);
        if (loss > worst) { worst = loss; worstMask = m; improved = true; }
        if (!all && loss > budget) return worst;
      }
    }
    solvedAtLast = tried.size;
    return worst;
  };
  const perZoneWorst = worstAt(1, true);
  let scale = 1;
  let worst = perZoneWorst;
  if (perZoneWorst > budget) {
    // The model's scale where its worst corner reaches the budget: losses grow about as s².
    const modelWorst = Math.max(...cornersAt(1).map((m) => modelLoss(m)));
    let inside = 0;
    let insideWorst = 0;
    let outside = 1;
    let trial = Math.min(0.95, Math.max(0.05, Math.sqrt(budget / Math.max(modelWorst, perZoneWorst))));
    while (outside - inside > SCALE_RESOLUTION) {
      const w = worstAt(trial, false);
      if (w <= budget) { inside = trial; insideWorst = w; } else outside = trial;
      trial = 0.5 * (inside + outside);
    }
    scale = inside;
    // Confirm the kept scale on every corner in its set.
    worst = inside > 0 ? Math.max(insideWorst, worstAt(inside, true)) : 0;
    if (inside === 0) solvedAtLast = 0;
  }
  const tolerances = single.map((t, z): ZoneTolerance => {
    const lo = y[z]! + scale * low[z]!;
    const hi = y[z]! + scale * high[z]!;
    const one = (log10: number): number => score.value - solve(y.map((v, i) => (i === z ? log10 : v)));
    return {
      ...t,
      lowPerCm3: 10 ** lo, highPerCm3: 10 ** hi,
      lowAtBound: t.lowAtBound && scale === 1, highAtBound: t.highAtBound && scale === 1,
      lossAtLow: scale === 1 ? t.lossAtLow : one(lo), lossAtHigh: scale === 1 ? t.lossAtHigh : one(hi),
    };
  });
  return { tolerances, check: { method, scale, cornersSolved: solvedAtLast, worstCornerLoss: worst, perZoneWorstCornerLoss: perZoneWorst }, evaluations: counter.evaluations };
}

/** The joint bands alone, as the sheet and the as-grown verdicts use them. */
export function zoneTolerances(p: DopingProblem, layout: ZoneLayout, score: DesignScore, budget: number): ZoneTolerance[] {
  return jointZoneBands(p, layout, score, budget).tolerances;
}
