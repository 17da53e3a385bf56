/**
 * Optimising a cascade: the free currents (box-bounded quasi-Newton,
 * minimizeBox) and, when asked, the couple counts — first relaxed to
 * continuous shares optimised together with the currents, then rounded and
 * moved ±1 couple between stages (or per stage, under a base area) while any
 * move improves, the currents re-optimised after each move.
 *
 * - maxDeltaT: the largest hotSide − Tc at the case's heat load.
 * - minPower: the least Σ stage power with the coldest stage at coldSide
 *   drawing exactly heatLoad. The free currents are λ·(direction); for each
 *   direction λ is the LOWER root of Qc(λ) = heatLoad at coldSide (Qc rises,
 *   peaks and falls with the current; the lower root costs less power), so
 *   the optimiser searches only the direction (and the counts). A feasible
 *   start comes from a maxDeltaT optimisation at the same load: if even that
 *   cannot reach coldSide, the cascade cannot hold the load there.
 */
import { cascadeSolver, type CascadePoint, type CascadeSolver } from './cascade';
import { coupleArea, type CheckedCascadeCase } from './cascade-case';
import { CaseError } from './case-error';
import { brentRoot } from './find-root';
import { minimizeBox } from './box-bfgs';

export type CascadeStart = { currents: number[]; counts: number[] };

export type CascadeProgress = {
  phase: 'feasible' | 'currents' | 'couples';
  iteration: number;
  /** ΔT [K] for maxDeltaT, power [W] for minPower, of the best point so far. */
  objective: number;
  currents: number[];
  counts: number[];
  evaluations: number;
};

export type CascadeOptimizeOptions = {
  onProgress?: (p: CascadeProgress) => void;
  /** Checked between iterations and moves; true returns the best point so far. */
  shouldStop?: () => boolean;
  /** Currents per stage and counts (continuous shares allowed) to start from: a checkpoint or a random start. */
  start?: CascadeStart;
  /** @default 1e-9 */
  tolerance?: number;
};

type Best = { point: CascadePoint; currents: number[]; counts: number[] };

export type CascadeOptimum = { point: CascadePoint; currents: number[]; counts: number[]; evaluations: number; stopped: boolean };

/** Currents are searched as I/I_ref within these bounds (I_ref = S̄·Th/R̄ of one couple of the stage). */
export const CURRENT_BOUNDS: [number, number] = [1e-3, 3];
/** Finite-difference step of every variable (scaled currents, log-ratios): between the truncation and the 3e-9 K solve noise. */
export const STEP = 3e-5;
const RATIO_LOG_BOUND = Math.log(30);

/** Largest-remainder rounding of positive counts to whole numbers ≥ 1 keeping the sum. */
export function roundCounts(counts: readonly number[], total: number): number[] {
  const floor = counts.map((v) => Math.max(1, Math.floor(v)));
  let left = total - floor.reduce((s, v) => s + v, 0);
  const order = counts.map((v, k) => ({ k, frac: v - Math.floor(v) })).sort((a, b) => b.frac - a.frac);
  for (const { k } of order) {
    if (left <= 0) break;
    floor[k]++;
    left--;
  }
  for (let k = floor.length - 1; left < 0 && k >= 0; k--) {
    const take = Math.min(floor[k] - 1, -left);
    floor[k] -= take;
    left += take;
  }
  return floor;
}

export type Layout = {
  /** Which stages each current variable drives (series: all). */
  freeGroups: number[][];
  fixed: (number | null)[];
  reference: number[];
};

export function layoutOf(c: CheckedCascadeCase, solver: CascadeSolver): Layout {
  const n = c.stages.length;
  const reference = solver.referenceCurrents(c.hotSide);
  if (c.wiring === 'series') {
    const fixed = new Array<number | null>(n).fill(c.currents[0]);
    return { freeGroups: c.currents[0] === null ? [c.stages.map((_, k) => k)] : [], fixed, reference: c.currents[0] === null ? [Math.max(...reference)] : [] };
  }
  const freeGroups = c.currents.flatMap((v, k) => (v === null ? [[k]] : []));
  return { freeGroups, fixed: [...c.currents], reference: freeGroups.map(([k]) => reference[k]) };
}

/** Counts from the count variables, and their box: see the file's comment. */
function countsModel(c: CheckedCascadeCase) {
  const n = c.stages.length;
  const limit = c.optimizeCouples;
  const given = c.stages.map((s) => s.couples);
  if (!limit || n === 1) {
    // One stage: the count only scales it; under a limit it takes all of it.
    const only = limit && 'total' in limit ? [limit.total] : limit && 'baseArea' in limit ? [Math.floor(limit.baseArea / coupleArea(c.stages[0]))] : given;
    return { vars: 0, counts: () => (n === 1 && limit ? only : given), lower: [] as number[], upper: [] as number[], start: [] as number[], round: (x: number[]) => x, neighbours: () => [] as number[][] };
  }
  const areas = c.stages.map(coupleArea);
  if ('total' in limit) {
    const total = limit.total;
    const counts = (v: readonly number[]) => {
      const w = [...v.map(Math.exp), 1];
      const sum = w.reduce((s, x) => s + x, 0);
      return w.map((x) => (total * x) / sum);
    };
    const start = (from: readonly number[]) => from.slice(0, n - 1).map((v) => Math.log(Math.max(v, 1) / Math.max(from[n - 1], 1)));
    return {
      vars: n - 1,
      counts,
      lower: new Array<number>(n - 1).fill(-Math.log(total)),
      upper: new Array<number>(n - 1).fill(Math.log(total)),
      start: start(given),
      startFrom: start,
      round: (x: number[]) => roundCounts(x, total),
      neighbours: (m: number[]) => {
        const out: number[][] = [];
        for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) if (i !== j && m[i] > 1) out.push(m.map((v, k) => (k === i ? v - 1 : k === j ? v + 1 : v)));
        return out;
      },
    };
  }
  // Base area: the hottest stage fills it; a colder stage's leg area may not exceed it.
  const top = Math.floor(limit.baseArea / areas[n - 1]);
  const base = top * areas[n - 1];
  const cap = areas.map((a) => Math.max(1, Math.floor(base / a)));
  const counts = (v: readonly number[]) => [...v.map((x, k) => (Math.exp(x) * base) / areas[k]), top];
  const start = (from: readonly number[]) => from.slice(0, n - 1).map((v, k) => Math.min(0, Math.log((Math.max(1, Math.min(v, cap[k])) * areas[k]) / base)));
  return {
    vars: n - 1,
    counts,
    lower: areas.slice(0, n - 1).map((a) => Math.min(0, Math.log(a / base))),
    upper: new Array<number>(n - 1).fill(0),
    start: start(given),
    startFrom: start,
    round: (x: number[]) => [...x.slice(0, n - 1).map((v, k) => Math.min(cap[k], Math.max(1, Math.round(v)))), top],
    neighbours: (m: number[]) => {
      const out: number[][] = [];
      for (let k = 0; k < n - 1; k++) for (const d of [-1, 1]) if (m[k] + d >= 1 && m[k] + d <= cap[k]) out.push(m.map((v, i) => (i === k ? v + d : v)));
      return out;
    },
  };
}

export function optimizeCascade(c: CheckedCascadeCase, o: CascadeOptimizeOptions = {}): CascadeOptimum {
  const tolerance = o.tolerance ?? 1e-9;
  const solver = cascadeSolver({ stages: c.stages }, tolerance);
  const layout = layoutOf(c, solver);
  const cm = countsModel(c);
  const nc = layout.freeGroups.length;
  const currentsOf = (scaled: readonly number[]) => {
    const out = layout.fixed.map((v) => v ?? 0);
    layout.freeGroups.forEach((group, i) => group.forEach((k) => (out[k] = scaled[i] * layout.reference[i])));
    return out;
  };
  const scaledOf = (currents: readonly number[]) => layout.freeGroups.map((group, i) => currents[group[0]] / layout.reference[i]);
  let stopped = false;
  const stop = () => {
    if (!stopped && o.shouldStop?.()) stopped = true;
    return stopped;
  };
  // The best point so far, updated by the objective's closures.
  const B: { score: number; best: Best | undefined } = { score: -Infinity, best: undefined };
  const consider = (point: CascadePoint | undefined, currents: number[], counts: number[], score: number) => {
    if (point && score > B.score) {
      B.score = score;
      B.best = { point, currents, counts };
    }
  };
  /** Read through a call: the closures update B, which TypeScript cannot see. */
  const kept = (): Best | undefined => B.best;
  const report = (phase: CascadeProgress['phase'], iteration: number) => {
    // For minPower the feasibility phase maximises ΔT at the load: its power
    // is not one that holds the cold side, so it is no "best power" to show.
    if (!B.best || (c.objective === 'minPower' && phase === 'feasible')) return;
    o.onProgress?.({ phase, iteration, objective: c.objective === 'maxDeltaT' ? c.hotSide - B.best.point.coldSide : B.best.point.power, currents: B.best.currents, counts: B.best.counts, evaluations: solver.evaluations() });
  };

  // ---- largest ΔT at the heat load ----
  const deltaTAt = (scaled: readonly number[], counts: number[], keep: boolean) => {
    const currents = currentsOf(scaled);
    const p = solver.at(currents, c.hotSide, { heatLoad: c.heatLoad }, counts);
    if (!p) return -Infinity;
    const dT = c.hotSide - p.coldSide;
    if (keep) consider(p, currents, counts, dT);
    return dT;
  };

  const startCounts = o.start?.counts ?? c.stages.map((s) => s.couples);
  const countVarsStart = cm.vars > 0 && 'startFrom' in cm && cm.startFrom ? cm.startFrom(startCounts) : cm.start;
  const startScaled = o.start ? scaledOf(o.start.currents).map((v) => Math.min(CURRENT_BOUNDS[1], Math.max(CURRENT_BOUNDS[0], v))) : new Array<number>(nc).fill(0.7);

  /** Maximise ΔT over the currents (and the relaxed counts when vars > 0). */
  const maximizeDeltaT = (scaled0: number[], countVars0: number[], withCounts: boolean, fixedCounts: number[], phase: CascadeProgress['phase']) => {
    const split = (x: readonly number[]) => ({ scaled: x.slice(0, nc), counts: withCounts ? cm.counts(x.slice(nc)) : fixedCounts });
    const x0 = [...scaled0, ...(withCounts ? countVars0 : [])];
    if (x0.length === 0) return { x: x0, value: -deltaTAt([], fixedCounts, true) };
    const r = minimizeBox(
      (x) => {
        const s = split(x);
        return -deltaTAt(s.scaled, s.counts, !withCounts);
      },
      x0,
      {
        lower: [...new Array<number>(nc).fill(CURRENT_BOUNDS[0]), ...(withCounts ? cm.lower : [])],
        upper: [...new Array<number>(nc).fill(CURRENT_BOUNDS[1]), ...(withCounts ? cm.upper : [])],
        steps: new Array<number>(x0.length).fill(STEP),
        gradientTolerance: 1e-5,
        valueTolerance: 1e-9,
        shouldStop: stop,
        onIteration: (it) => report(phase, it),
      },
    );
    return r;
  };

  // ---- least power at coldSide and heatLoad ----
  const coldSide = c.coldSide ?? c.hotSide;
  let lambdaWarm = 1;
  /** The free currents λ·direction·I_ref at the lower root of Qc = heatLoad; undefined when no current holds it. */
  const holding = (direction: readonly number[], counts: number[]) => {
    const at = (lambda: number) => solver.at(currentsOf(direction.map((d) => lambda * d)), c.hotSide, { coldSide }, counts);
    const scale = Math.max(c.heatLoad, 1e-6);
    const h = (lambda: number) => {
      const p = at(lambda);
      return p ? p.heatLoad - c.heatLoad : NaN;
    };
    // Secant from the last root: neighbouring directions have neighbouring roots.
    let a = lambdaWarm;
    let b = lambdaWarm * (1 + 1e-3);
    let fa = h(a);
    let fb = h(b);
    for (let it = 0; it < 10 && Number.isFinite(fa) && Number.isFinite(fb) && fb !== fa; it++) {
      const next = b - (fb * (b - a)) / (fb - fa);
      if (!(next > 0)) break;
      [a, fa] = [b, fb];
      b = next;
      fb = h(b);
      // The lower root only: Qc must still be rising there (a chord across the peak can look rising at the upper root).
      if (Math.abs(fb) <= 1e-10 * scale && h(b * (1 + 1e-4)) > fb) {
        lambdaWarm = b;
        return { lambda: b, point: at(b) };
      }
    }
    // Bracket: walk up in λ from near zero (Qc < 0 there: heat leaks in) to the first λ holding the load.
    // A walk, not a maximiser: beyond the peak lies thermal runaway, where nothing has a steady state.
    let lo = 0.02 * Math.max(lambdaWarm, 1);
    let flo = h(lo);
    if (!(flo < 0)) return undefined;
    let hi = lo;
    let fhi = flo;
    for (;;) {
      hi = lo * 1.25;
      fhi = h(hi);
      if (!Number.isFinite(fhi) || fhi < flo) return undefined;
      if (fhi >= 0) break;
      [lo, flo] = [hi, fhi];
    }
    const root = brentRoot(h, lo, hi, flo, fhi, 1e-13 * hi);
    lambdaWarm = root.root;
    return { lambda: root.root, point: at(root.root) };
  };
  /** Direction variables: log of each free current's share relative to the first. */
  const directionOf = (v: readonly number[]) => [1, ...v.map(Math.exp)];
  const powerAt = (v: readonly number[], counts: number[], keep: boolean) => {
    const direction = directionOf(v);
    const r = holding(direction, counts);
    if (!r || !r.point) return Infinity;
    if (keep) consider(r.point, currentsOf(direction.map((d) => r.lambda * d)), counts, -r.point.power);
    return r.point.power;
  };
  const minimizePower = (v0: number[], countVars0: number[], withCounts: boolean, fixedCounts: number[], phase: CascadeProgress['phase']) => {
    const nd = nc - 1;
    const split = (x: readonly number[]) => ({ v: x.slice(0, nd), counts: withCounts ? cm.counts(x.slice(nd)) : fixedCounts });
    const x0 = [...v0, ...(withCounts ? countVars0 : [])];
    if (x0.length === 0) return { x: x0, value: powerAt([], fixedCounts, true) };
    return minimizeBox(
      (x) => {
        const s = split(x);
        return powerAt(s.v, s.counts, !withCounts);
      },
      x0,
      {
        lower: [...new Array<number>(nd).fill(-RATIO_LOG_BOUND), ...(withCounts ? cm.lower : [])],
        upper: [...new Array<number>(nd).fill(RATIO_LOG_BOUND), ...(withCounts ? cm.upper : [])],
        steps: new Array<number>(x0.length).fill(STEP),
        gradientTolerance: 1e-9 * Math.max(1, c.heatLoad),
        valueTolerance: 1e-12,
        shouldStop: stop,
        onIteration: (it) => report(phase, it),
      },
    );
  };
  const directionVars = (scaled: readonly number[]) => scaled.slice(1).map((v) => Math.log(v / scaled[0]));

  const optimizeCurrents = (scaled0: number[], counts: number[], phase: CascadeProgress['phase']) =>
    c.objective === 'maxDeltaT' ? maximizeDeltaT(scaled0, [], false, counts, phase) : minimizePower(directionVars(scaled0), [], false, counts, phase);

  // ---- 1. continuous: currents (and relaxed counts) ----
  let countsNow = cm.vars > 0 ? cm.counts(countVarsStart) : cm.counts([]);
  let scaledNow = startScaled;
  if (c.objective === 'maxDeltaT' || cm.vars > 0) {
    // For minPower this is the feasibility phase: the largest ΔT at the load.
    const r = maximizeDeltaT(startScaled, countVarsStart, cm.vars > 0, countsNow, c.objective === 'maxDeltaT' ? 'currents' : 'feasible');
    scaledNow = r.x.slice(0, nc);
    if (cm.vars > 0) countsNow = cm.counts(r.x.slice(nc));
  }
  if (c.objective === 'minPower') {
    if (cm.vars === 0 && nc > 0) {
      // Feasibility at the given counts: the largest ΔT over the free currents.
      const r = maximizeDeltaT(scaledNow, [], false, countsNow, 'feasible');
      scaledNow = r.x;
    }
    const reach = solver.at(currentsOf(scaledNow), c.hotSide, { heatLoad: c.heatLoad }, countsNow);
    if (!reach || reach.coldSide > coldSide) {
      const most = reach ? `; at that load its largest ΔT is ${(c.hotSide - reach.coldSide).toPrecision(4)} K (cold side ${reach.coldSide.toPrecision(5)} K)` : '';
      throw new CaseError('coldSide', `the cascade cannot hold ${c.heatLoad} W at ${coldSide} K with its couples${most}: raise coldSide, lower heatLoad, or add couples or a stage`);
    }
    // The max-ΔT currents draw at least the load at coldSide: λ = 1 brackets the lower root.
    lambdaWarm = 1;
    B.score = -Infinity;
    B.best = undefined;
    const r = minimizePower(directionVars(scaledNow), [], false, countsNow, 'currents');
    if (cm.vars > 0 && 'startFrom' in cm && cm.startFrom) {
      const joint = minimizePower(r.x, cm.startFrom(countsNow), true, countsNow, 'currents');
      countsNow = cm.counts(joint.x.slice(nc - 1));
    }
  }
  // ---- 2. whole couples: round, then ±1 moves while one improves ----
  if (cm.vars > 0 && !stop()) {
    const relaxed = countsNow;
    let counts = cm.round(relaxed);
    if (c.objective === 'minPower' && B.best) scaledNow = scaledOf(B.best.currents);
    const scoreOf = (from: number[], cts: number[]) => {
      const before = B.score;
      optimizeCurrents(from, cts, 'couples');
      const here = B.best && B.best.counts === cts ? B.score : -Infinity;
      return { improved: B.score > before, score: here };
    };
    // Only whole-count points count from here on.
    B.score = -Infinity;
    B.best = undefined;
    scoreOf(scaledNow, counts);
    let round = 0;
    for (let improved = true; improved && !stop() && round < 200; round++) {
      improved = false;
      for (const m of cm.neighbours(counts)) {
        if (stop()) break;
        const held = kept();
        const from = held ? scaledOf(held.currents) : scaledNow;
        if (scoreOf(from, m).improved) {
          counts = m;
          improved = true;
          report('couples', round);
          break;
        }
      }
    }
  } else if (c.objective === 'maxDeltaT' && cm.vars === 0 && !B.best) {
    deltaTAt(scaledNow, countsNow, true);
  }
  const b = kept();
  if (!b) throw new CaseError(c.objective === 'minPower' ? 'coldSide' : 'heatLoad', `the cascade has no steady state at ${c.heatLoad} W at any of the currents tried`);
  return { point: b.point, currents: b.currents, counts: b.counts, evaluations: solver.evaluations(), stopped };
}
