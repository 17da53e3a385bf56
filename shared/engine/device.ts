/**
 * A cooling device as the operating-curve code sees it: legs electrically in
 * series and thermally in parallel between a cold and a hot junction plane —
 * one leg, a couple (p + n) or a module of N couples (each leg counted N
 * times) — optionally behind ceramic plates of thermal resistance Θc, Θh
 * [K/W] between the junctions and the load / heat sink.
 *
 * At a current I with the load at T_load and the sink at T_sink the junction
 * temperatures follow from
 *
 *   Tc_j = T_load − Θc·Qc(Tc_j, Th_j),   Th_j = T_sink + Θh·Qh(Tc_j, Th_j),
 *
 * solved by Newton's method with Broyden's update, starting from the
 * constant-property Jacobian (dQc/dTc = S·I + K, dQc/dTh = −K, dQh/dTc = K,
 * dQh/dTh = S·I − K of the averaged legs). With the heat load given instead
 * of T_load (the largest ΔT, Qc = 0), the first equation becomes
 * Qc(Tc_j, Th_j) = Qc and T_load = Tc_j + Θc·Qc. Without plates and with
 * T_load given there is nothing to solve: one evaluation.
 */
import type { Leg } from './leg-profile';
import { legPointAt, newLegPointWarm, type LegPointWarm } from './leg-point';
import { contactSum } from './leg-ends';
import { legAverages } from './shoot';

export type DeviceLeg = { leg: Leg; count: number };

export type Device = {
  legs: DeviceLeg[];
  /** Thermal resistance between the load and the cold junctions [K/W]; 0 = none. */
  coldPlateResistance: number;
  /** Thermal resistance between the hot junctions and the heat sink [K/W]; 0 = none. */
  hotPlateResistance: number;
};

/** The device at one current, everything in device totals. */
export type DevicePoint = {
  current: number;
  /** Heat drawn from the load [W]. */
  heatLoad: number;
  /** Heat delivered to the sink [W]. */
  heatRejected: number;
  /** Voltage across the device [V], contacts included. */
  voltage: number;
  /** Electrical input V·I [W]. */
  power: number;
  /** Qc/P; null when no power is drawn. */
  cop: number | null;
  /** Load and sink temperatures [K]. */
  coldSide: number;
  hotSide: number;
  /** Junction temperatures [K] (equal to the load's and sink's without plates). */
  coldJunction: number;
  hotJunction: number;
};

/** What fixes the cold side: the load temperature, or the heat drawn from it. */
export type ColdCondition = { coldSide: number } | { heatLoad: number };

export type DeviceSolver = {
  device: Device;
  tolerance: number;
  /** The device at current I [A] with the sink at hotSide; undefined without a steady state. */
  at(current: number, hotSide: number, cold: ColdCondition): DevicePoint | undefined;
  /** Σ|S̄|·T / ΣR̄ (contacts included): the scale of useful currents. */
  referenceCurrent(temperature: number): number;
  /** Leg solves so far. */
  evaluations(): number;
};

type Averages = { seebeck: number; resistance: number; conductance: number };

const MAX_ITERATIONS = 60;
/** Junction temperatures are solved to this × the solve tolerance × Th (3e-8 K at 1e-9 and 300 K: ~1e-9 of Qc). */
const JUNCTION_TOLERANCE = 0.1;
/** Newton steps into a region without a steady state are halved this many times before the point counts as having none. */
const MAX_HALVINGS = 4;

export function deviceSolver(device: Device, tolerance: number): DeviceSolver {
  const warms: LegPointWarm[] = device.legs.map((d) => newLegPointWarm(d.leg));
  let evaluations = 0;

  /** Device totals of the averaged legs at one temperature (for guesses and the first Jacobian). */
  const averages = (temperature: number): Averages => {
    let seebeck = 0;
    let resistance = 0;
    let conductance = 0;
    for (const { leg, count } of device.legs) {
      const a = legAverages(leg, temperature);
      seebeck += count * Math.abs(a.seebeck);
      resistance += (count * (a.resistivity * leg.length + contactSum(leg.ends))) / leg.area;
      conductance += (count * a.kappa * leg.area) / leg.length;
    }
    return { seebeck, resistance, conductance };
  };

  /** Device totals with the junctions at (Tc, Th). */
  const junctions = (current: number, tc: number, th: number) => {
    let heatLoad = 0;
    let heatRejected = 0;
    let voltage = 0;
    for (let i = 0; i < device.legs.length; i++) {
      const { leg, count } = device.legs[i];
      evaluations++;
      const p = legPointAt(leg, current, tc, th, tolerance, warms[i]);
      if (!p) return undefined;
      heatLoad += count * p.heatLoad;
      heatRejected += count * p.heatRejected;
      voltage += count * p.voltage;
    }
    return { heatLoad, heatRejected, voltage };
  };

  /**
   * The constant-property model of the device at current I: Qc = s·I·Tc −
   * k(Th − Tc) − ½I²R, Qh = s·I·Th − k(Th − Tc) + ½I²R with the averaged
   * legs. It gives the junction equations' Jacobian and, solved (they are
   * then linear), the first guess of the junction temperatures.
   */
  const model = (current: number, hotSide: number, cold: ColdCondition, avg: Averages) => {
    const thetaC = device.coldPlateResistance;
    const thetaH = device.hotPlateResistance;
    const { seebeck: s, conductance: k, resistance: r } = avg;
    const joule = 0.5 * current * current * r;
    const dqcTc = s * current + k;
    const dqhTh = s * current - k;
    // Rows: residuals in kelvin (the heat-load row divided by dQc/dTc).
    const b11 = 'coldSide' in cold ? 1 + thetaC * dqcTc : 1;
    const b12 = 'coldSide' in cold ? -thetaC * k : -k / dqcTc;
    const b21 = -thetaH * k;
    const b22 = 1 - thetaH * dqhTh;
    const rhs1 = 'coldSide' in cold ? cold.coldSide + thetaC * joule : (cold.heatLoad + joule) / dqcTc;
    const rhs2 = hotSide + thetaH * joule;
    const det = b11 * b22 - b12 * b21;
    return { b: [b11, b12, b21, b22], tc: (rhs1 * b22 - b12 * rhs2) / det, th: (b11 * rhs2 - b21 * rhs1) / det, dqcTc };
  };

  /**
   * The last two solved points with plates under the same conditions: the
   * model's error in the junction temperatures, extrapolated linearly in the
   * current, corrects the next guess, and the last Jacobian's difference from
   * the model's corrects the next Jacobian.
   */
  type Solved = { current: number; hotSide: number; cold: ColdCondition; errorTc: number; errorTh: number; deltaB: number[] };
  let recent: Solved[] = [];
  const sameConditions = (a: Solved, hotSide: number, cold: ColdCondition) =>
    a.hotSide === hotSide && ('coldSide' in a.cold ? 'coldSide' in cold && a.cold.coldSide === cold.coldSide : 'heatLoad' in cold && a.cold.heatLoad === cold.heatLoad);

  const at = (current: number, hotSide: number, cold: ColdCondition): DevicePoint | undefined => {
    const thetaC = device.coldPlateResistance;
    const thetaH = device.hotPlateResistance;
    const loadGiven = 'coldSide' in cold;
    const finish = (tc: number, th: number, q: { heatLoad: number; heatRejected: number; voltage: number }): DevicePoint => {
      const power = q.voltage * current;
      return {
        current,
        heatLoad: q.heatLoad,
        heatRejected: q.heatRejected,
        voltage: q.voltage,
        power,
        cop: power > 0 ? q.heatLoad / power : null,
        coldSide: loadGiven ? cold.coldSide : tc + thetaC * q.heatLoad,
        hotSide,
        coldJunction: tc,
        hotJunction: th,
      };
    };
    if (loadGiven && thetaC === 0 && thetaH === 0) {
      const q = junctions(current, cold.coldSide, hotSide);
      return q && finish(cold.coldSide, hotSide, q);
    }
    const avg = averages(loadGiven ? 0.5 * (cold.coldSide + hotSide) : hotSide);
    const m = model(current, hotSide, cold, avg);
    let [b11, b12, b21, b22] = m.b;
    let u0 = m.tc;
    let u1 = m.th;
    const similar = recent.filter((p) => sameConditions(p, hotSide, cold));
    if (similar.length > 0) {
      const [a, b] = [similar[similar.length - 1], similar[similar.length - 2]];
      // Linear in the current through the last two (constant with one).
      const w = b && b.current !== a.current ? (current - a.current) / (a.current - b.current) : 0;
      u0 += a.errorTc + (b ? w * (a.errorTc - b.errorTc) : 0);
      u1 += a.errorTh + (b ? w * (a.errorTh - b.errorTh) : 0);
      b11 += a.deltaB[0];
      b12 += a.deltaB[1];
      b21 += a.deltaB[2];
      b22 += a.deltaB[3];
    }
    if (!(u0 > 0 && u0 <= hotSide + 1e3 && u1 > 0)) {
      u0 = loadGiven ? cold.coldSide : 0.5 * hotSide;
      u1 = hotSide;
    }
    const residual = (tc: number, th: number, q: { heatLoad: number; heatRejected: number }): [number, number] => [
      loadGiven ? tc + thetaC * q.heatLoad - cold.coldSide : (q.heatLoad - cold.heatLoad) / m.dqcTc,
      th - thetaH * q.heatRejected - hotSide,
    ];
    let q = junctions(current, u0, u1);
    if (!q && similar.length > 0) {
      u0 = m.tc;
      u1 = m.th;
      q = junctions(current, u0, u1);
    }
    if (!q) return undefined;
    let r = residual(u0, u1, q);
    const limit = JUNCTION_TOLERANCE * tolerance * hotSide;
    const done = (): DevicePoint => {
      const solved: Solved = { current, hotSide, cold, errorTc: u0 - m.tc, errorTh: u1 - m.th, deltaB: [b11 - m.b[0], b12 - m.b[1], b21 - m.b[2], b22 - m.b[3]] };
      recent = [...recent.filter((p) => sameConditions(p, hotSide, cold)).slice(-1), solved];
      return finish(u0, u1, q as { heatLoad: number; heatRejected: number; voltage: number });
    };
    for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
      if (Math.abs(r[0]) <= limit && Math.abs(r[1]) <= limit) return done();
      const det = b11 * b22 - b12 * b21;
      if (!(Math.abs(det) > 0)) return undefined;
      let d0 = -(b22 * r[0] - b12 * r[1]) / det;
      let d1 = -(-b21 * r[0] + b11 * r[1]) / det;
      let next: { heatLoad: number; heatRejected: number; voltage: number } | undefined;
      for (let h = 0; h <= MAX_HALVINGS; h++) {
        next = u0 + d0 > 0 && u1 + d1 > 0 ? junctions(current, u0 + d0, u1 + d1) : undefined;
        if (next) break;
        d0 *= 0.5;
        d1 *= 0.5;
      }
      if (!next) return undefined;
      const rn = residual(u0 + d0, u1 + d1, next);
      // Broyden's update: B += (Δr − B·Δu)·Δuᵀ / (Δuᵀ·Δu).
      const norm = d0 * d0 + d1 * d1;
      if (norm > 0) {
        const e0 = rn[0] - r[0] - (b11 * d0 + b12 * d1);
        const e1 = rn[1] - r[1] - (b21 * d0 + b22 * d1);
        b11 += (e0 * d0) / norm;
        b12 += (e0 * d1) / norm;
        b21 += (e1 * d0) / norm;
        b22 += (e1 * d1) / norm;
      }
      u0 += d0;
      u1 += d1;
      q = next;
      r = rn;
    }
    return Math.abs(r[0]) <= 1e3 * limit && Math.abs(r[1]) <= 1e3 * limit ? done() : undefined;
  };

  return {
    device,
    tolerance,
    at,
    referenceCurrent(temperature: number) {
      const avg = averages(temperature);
      return (avg.seebeck * temperature) / avg.resistance;
    },
    evaluations: () => evaluations,
  };
}
