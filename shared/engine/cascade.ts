/**
 * A multi-stage cooler (a cascade): 1–4 modules stacked coldest first. Stage
 * k is N_k couples of its own p and n legs at its own current (one current
 * through all stages with series wiring); the heat it rejects is the load of
 * stage k + 1, through an interface of thermal resistance R_k (ceramic plates,
 * grease) between its hot junctions and the next stage's cold junctions. The
 * last stage's interface is its resistance to the sink at hotSide.
 *
 * Unknowns: every stage's junction temperatures u = (Tc_0, Th_0, …, Tc_n−1,
 * Th_n−1). Equations, as residuals in kelvin:
 *
 *   cold:       Tc_0 = coldSide               or  (Qc_0 − Q)/d_0 = 0
 *   interface:  Th_k − R_k·Qh_k − Tc_k+1 = 0,    (Qc_k+1 − Qh_k)/d_k+1 = 0
 *   sink:       Th_n−1 − R_n−1·Qh_n−1 − hotSide = 0
 *
 * (d_k = dQc_k/dTc_k of the constant-property model, so a heat row reads in
 * kelvin too). Solved like the module's plates (device.ts): Newton's method
 * with Broyden's update, starting from the constant-property model of the
 * averaged legs — there the equations are linear, so its solution is the
 * first guess and its matrix the first Jacobian. The model's error at the last
 * solve corrects the next guess and Jacobian: the optimiser calls this
 * thousands of times at nearby currents and counts, each then costing 1–3
 * evaluations of all legs.
 */
import { type LegDefinition, legFromDefinition } from './module';
import type { Leg } from './leg-profile';
import { contactSum } from './leg-ends';
import { legPointAt, newLegPointWarm, type LegPointWarm } from './leg-point';
import { legAverages } from './shoot';

export type CascadeStage = {
  /** Couples in this stage (a whole number for a real cascade; the optimiser passes fractions while it relaxes them). */
  couples: number;
  p: LegDefinition;
  n: LegDefinition;
  /** Thermal resistance from this stage's hot junctions to the next stage's cold junctions (the sink, for the last) [K/W]. */
  interfaceResistance: number;
};

export type CascadeDefinition = { stages: CascadeStage[] };

/** What fixes the coldest stage's cold side: its temperature, or the heat drawn from the load. */
export type CascadeCold = { coldSide: number } | { heatLoad: number };

export type CascadeStagePoint = {
  /** Cold and hot junction temperatures [K]. */
  coldSide: number;
  hotSide: number;
  current: number;
  /** Across the stage's N couples [V], and V·I [W]. */
  voltage: number;
  power: number;
  /** Heat drawn at the cold junctions, rejected at the hot ones [W]. */
  heatLoad: number;
  heatRejected: number;
  couples: number;
};

export type CascadePoint = {
  /** The coldest stage's cold side [K] and the sink [K]. */
  coldSide: number;
  hotSide: number;
  /** Heat drawn from the load by the coldest stage [W]. */
  heatLoad: number;
  /** Σ stage powers [W]; heatLoad / power, null when no power is drawn. */
  power: number;
  cop: number | null;
  stages: CascadeStagePoint[];
};

export type CascadeSolver = {
  /** The cascade at one current per stage (counts: override the stages' couples); undefined without a steady state. */
  at(currents: readonly number[], hotSide: number, cold: CascadeCold, counts?: readonly number[]): CascadePoint | undefined;
  /** Per stage, Σ|S̄|·T/ΣR̄ of one couple at T: the scale of its useful currents [A]. */
  referenceCurrents(temperature: number): number[];
  /** Leg solves so far. */
  evaluations(): number;
  stages: number;
};

/** Junction equations are solved to this × the tolerance × Th (3e-9 K at 1e-9 and 300 K). */
const JUNCTION_TOLERANCE = 0.01;
const MAX_ITERATIONS = 60;
const MAX_HALVINGS = 4;

type StageLegs = { p: Leg; n: Leg; warmP: LegPointWarm; warmN: LegPointWarm };

/** Solve the dense system A·x = y (Gaussian elimination, partial pivoting); undefined when singular. */
export function solveDense(matrix: readonly number[][], y: readonly number[]): number[] | undefined {
  const n = y.length;
  const m = matrix.map((row, i) => [...row, y[i]]);
  for (let c = 0; c < n; c++) {
    let pivot = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r][c]) > Math.abs(m[pivot][c])) pivot = r;
    if (!(Math.abs(m[pivot][c]) > 0)) return undefined;
    [m[c], m[pivot]] = [m[pivot], m[c]];
    for (let r = c + 1; r < n; r++) {
      const f = m[r][c] / m[c][c];
      if (f !== 0) for (let j = c; j <= n; j++) m[r][j] -= f * m[c][j];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = m[r][n];
    for (let j = r + 1; j < n; j++) s -= m[r][j] * x[j];
    x[r] = s / m[r][r];
  }
  return x;
}

export function cascadeSolver(def: CascadeDefinition, tolerance: number): CascadeSolver {
  const n = def.stages.length;
  const legs: StageLegs[] = def.stages.map((s) => {
    const p = legFromDefinition(s.p);
    const nLeg = legFromDefinition(s.n);
    return { p, n: nLeg, warmP: newLegPointWarm(p), warmN: newLegPointWarm(nLeg) };
  });
  let evaluations = 0;
  /** The last solve: the model's error in u and in the Jacobian, per cold condition kind. */
  const last: Record<'coldSide' | 'heatLoad', { du: number[]; dB: number[][]; u: number[] } | undefined> = { coldSide: undefined, heatLoad: undefined };

  /** One couple's averaged legs at T: Seebeck sum, resistance (contacts included), conductance, fixed parasitic load. */
  const couple = (k: number, temperature: number) => {
    let s = 0;
    let r = 0;
    let g = 0;
    let parasitic = 0;
    for (const leg of [legs[k].p, legs[k].n]) {
      const a = legAverages(leg, temperature);
      s += Math.abs(a.seebeck);
      r += (a.resistivity * leg.length + contactSum(leg.ends)) / leg.area;
      g += (a.kappa * leg.area) / leg.length;
      parasitic += leg.ends?.parasitic?.heatLoad ?? 0;
    }
    return { s, r, g, parasitic };
  };

  /**
   * The constant-property cascade: per stage Qc = a·Tc − g·Th + c, Qh = g·Tc
   * + (s·I − g)·Th + ½I²R (totals of N couples), so every residual is linear
   * in u: B·u − rhs. Returns B, rhs and its solution.
   */
  const model = (currents: readonly number[], counts: readonly number[], hotSide: number, cold: CascadeCold, temps: readonly number[]) => {
    const B = Array.from({ length: 2 * n }, () => new Array<number>(2 * n).fill(0));
    const rhs = new Array<number>(2 * n).fill(0);
    const st = def.stages.map((_, k) => {
      const c = couple(k, temps[k]);
      const N = counts[k];
      const I = currents[k];
      const s = N * c.s;
      const g = N * c.g;
      const joule = 0.5 * I * I * N * c.r;
      // Qc = a·Tc + bTh·Th + qc0; Qh = g·Tc + hTh·Th + qh0.
      return { a: s * I + g, bTh: -g, qc0: -joule - N * c.parasitic, g, hTh: s * I - g, qh0: joule };
    });
    const d = st.map((m) => Math.max(m.a, m.g, 1e-300));
    if ('coldSide' in cold) {
      B[0][0] = 1;
      rhs[0] = cold.coldSide;
    } else {
      B[0][0] = st[0].a / d[0];
      B[0][1] = st[0].bTh / d[0];
      rhs[0] = (cold.heatLoad - st[0].qc0) / d[0];
    }
    for (let k = 0; k < n; k++) {
      const R = def.stages[k].interfaceResistance;
      const row = 2 * k + 1;
      // Th_k − R·Qh_k − (Tc_k+1 or hotSide) = 0
      B[row][2 * k] = -R * st[k].g;
      B[row][2 * k + 1] = 1 - R * st[k].hTh;
      rhs[row] = R * st[k].qh0;
      if (k + 1 < n) {
        B[row][2 * k + 2] = -1;
        // (Qc_k+1 − Qh_k)/d_k+1 = 0
        const hr = 2 * k + 2;
        const dk = d[k + 1];
        B[hr][2 * k + 2] = st[k + 1].a / dk;
        B[hr][2 * k + 3] = st[k + 1].bTh / dk;
        B[hr][2 * k] = -st[k].g / dk;
        B[hr][2 * k + 1] = -st[k].hTh / dk;
        rhs[hr] = (st[k].qh0 - st[k + 1].qc0) / dk;
      } else {
        rhs[row] += hotSide;
      }
    }
    return { B, rhs, d, u: solveDense(B, rhs) };
  };

  /** Every stage's legs at the junction temperatures u. */
  const evaluate = (currents: readonly number[], counts: readonly number[], u: readonly number[]) => {
    const out: { heatLoad: number; heatRejected: number; voltage: number }[] = [];
    for (let k = 0; k < n; k++) {
      const tc = u[2 * k];
      const th = u[2 * k + 1];
      if (!(tc > 0 && th > 0)) return undefined;
      const L = legs[k];
      evaluations += 2;
      const p = legPointAt(L.p, currents[k], tc, th, tolerance, L.warmP);
      if (!p) return undefined;
      const q = legPointAt(L.n, currents[k], tc, th, tolerance, L.warmN);
      if (!q) return undefined;
      const N = counts[k];
      out.push({ heatLoad: N * (p.heatLoad + q.heatLoad), heatRejected: N * (p.heatRejected + q.heatRejected), voltage: N * (p.voltage + q.voltage) });
    }
    return out;
  };

  const at = (currents: readonly number[], hotSide: number, cold: CascadeCold, countsIn?: readonly number[]): CascadePoint | undefined => {
    const counts = countsIn ?? def.stages.map((s) => s.couples);
    if (currents.length !== n || counts.length !== n) throw new Error(`cascade: ${n} stages need ${n} currents and counts`);
    const kind = 'coldSide' in cold ? 'coldSide' : 'heatLoad';
    const prior = last[kind];
    // Property averages at each stage's mean temperature (the last solve's, or a linear guess).
    const temps = def.stages.map((_, k) => (prior ? 0.5 * (prior.u[2 * k] + prior.u[2 * k + 1]) : hotSide * (1 - (0.25 * (n - k)) / (n + 1))));
    const m = model(currents, counts, hotSide, cold, temps);
    if (!m.u) return undefined;
    const modelU = m.u;
    let u = [...modelU];
    let B = m.B.map((row) => [...row]);
    if (prior) {
      const guess = u.map((v, i) => v + prior.du[i]);
      if (guess.every((v) => v > 0)) {
        u = guess;
        B = B.map((row, i) => row.map((v, j) => v + prior.dB[i][j]));
      }
    }
    const residual = (x: readonly number[], q: { heatLoad: number; heatRejected: number }[]): number[] => {
      const r = new Array<number>(2 * n);
      r[0] = 'coldSide' in cold ? x[0] - cold.coldSide : (q[0].heatLoad - cold.heatLoad) / m.d[0];
      for (let k = 0; k < n; k++) {
        const R = def.stages[k].interfaceResistance;
        r[2 * k + 1] = x[2 * k + 1] - R * q[k].heatRejected - (k + 1 < n ? x[2 * k + 2] : hotSide);
        if (k + 1 < n) r[2 * k + 2] = (q[k + 1].heatLoad - q[k].heatRejected) / m.d[k + 1];
      }
      return r;
    };
    let q = evaluate(currents, counts, u);
    if (!q && prior) {
      u = [...modelU];
      B = m.B.map((row) => [...row]);
      q = evaluate(currents, counts, u);
    }
    if (!q) return undefined;
    let r = residual(u, q);
    const limit = JUNCTION_TOLERANCE * tolerance * hotSide;
    const converged = (x: number[]) => x.every((v) => Math.abs(v) <= limit);
    let ok = false;
    for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
      if (converged(r)) {
        ok = true;
        break;
      }
      const step = solveDense(B, r.map((v) => -v));
      if (!step) return undefined;
      let next: ReturnType<typeof evaluate>;
      let du = step;
      for (let h = 0; h <= MAX_HALVINGS; h++) {
        next = evaluate(currents, counts, u.map((v, i) => v + du[i]));
        if (next) break;
        du = du.map((v) => 0.5 * v);
      }
      if (!next) return undefined;
      const un = u.map((v, i) => v + du[i]);
      const rn = residual(un, next);
      // Broyden's update: B += (Δr − B·Δu)·Δuᵀ / (Δuᵀ·Δu).
      const norm = du.reduce((s, v) => s + v * v, 0);
      if (norm > 0) {
        for (let i = 0; i < 2 * n; i++) {
          let e = rn[i] - r[i];
          for (let j = 0; j < 2 * n; j++) e -= B[i][j] * du[j];
          for (let j = 0; j < 2 * n; j++) B[i][j] += (e * du[j]) / norm;
        }
      }
      u = un;
      q = next;
      r = rn;
    }
    if (!ok && !r.every((v) => Math.abs(v) <= 1e3 * limit)) return undefined;
    last[kind] = { u: [...u], du: u.map((v, i) => v - modelU[i]), dB: B.map((row, i) => row.map((v, j) => v - m.B[i][j])) };
    const solved = q;
    const stages = def.stages.map((_, k): CascadeStagePoint => ({
      coldSide: u[2 * k],
      hotSide: u[2 * k + 1],
      current: currents[k],
      voltage: solved[k].voltage,
      power: solved[k].voltage * currents[k],
      heatLoad: solved[k].heatLoad,
      heatRejected: solved[k].heatRejected,
      couples: counts[k],
    }));
    const power = stages.reduce((s, st) => s + st.power, 0);
    return { coldSide: u[0], hotSide, heatLoad: stages[0].heatLoad, power, cop: power > 0 ? stages[0].heatLoad / power : null, stages };
  };

  return {
    at,
    referenceCurrents: (temperature) =>
      def.stages.map((_, k) => {
        const c = couple(k, temperature);
        return (c.s * temperature) / c.r;
      }),
    evaluations: () => evaluations,
    stages: n,
  };
}

/** One solve with a fresh solver (tests, single evaluations); the optimiser keeps one solver for its warm starts. */
export function cascadeAt(def: CascadeDefinition, currents: number | readonly number[], hotSide: number, cold: CascadeCold, tolerance = 1e-9): CascadePoint | undefined {
  const list = typeof currents === 'number' ? def.stages.map(() => currents) : currents;
  return cascadeSolver(def, tolerance).at(list, hotSide, cold);
}
