/**
 * Independent references for the solver tests: the leg equations integrated
 * by odex (Gragg–Bulirsch–Stoer extrapolation) with a plain bisection on Tc,
 * and the exact piecewise-quadratic solution of constant-property segments.
 * Neither shares code with the engine's integrator or root finders; both use
 * the engine's property families (the model under test is the same).
 */
import type { Leg } from '../leg-profile';
import type { Properties } from '../material-family';
import { odexSolver } from './odex';

export type ReferenceEnd = { temperature: number; flux: number; voltage: number };

/** Integrate (T, q, V) over the leg with odex, restarting at every section boundary. */
export function odexHotEnd(leg: Leg, currentDensity: number, coldSide: number, coldFlux: number, tolerance = 1e-13): ReferenceEnd {
  const J = currentDensity;
  const solver = odexSolver(3, tolerance);
  const p: Properties = { seebeck: 0, sigma: 0, kappa: 0 };
  let y = [coldSide, coldFlux, 0];
  for (const s of leg.sections) {
    const slope = (s.log10End - s.log10Start) / (s.end - s.start);
    const f = (x: number, state: number[]) => {
      s.family.properties(s.log10Start + slope * (x - s.start), state[0], p);
      const dT = (p.seebeck * state[0] * J - state[1]) / p.kappa;
      return [dT, (J * J) / p.sigma + J * p.seebeck * dT, J / p.sigma + p.seebeck * dT];
    };
    const r = solver.solve(f, s.start, y, s.end);
    if (r.outcome !== 0) throw new Error(`odex did not converge (outcome ${r.outcome})`);
    y = r.y;
  }
  return { temperature: y[0], flux: y[1], voltage: y[2] };
}

/** Tc such that T(L) = Th, by bisection on odex integrations (slow and sure). */
export function odexColdSide(leg: Leg, currentDensity: number, hotSide: number, coldFlux: number, low: number, high: number): number {
  let a = low;
  let b = high;
  const gap = (tc: number) => odexHotEnd(leg, currentDensity, tc, coldFlux).temperature - hotSide;
  let ga = gap(a);
  if (Math.sign(ga) === Math.sign(gap(b))) throw new Error('reference bisection: no bracket');
  for (let k = 0; k < 60 && b - a > 1e-12 * b; k++) {
    const m = 0.5 * (a + b);
    const gm = gap(m);
    if (Math.sign(gm) === Math.sign(ga)) {
      a = m;
      ga = gm;
    } else b = m;
  }
  return 0.5 * (a + b);
}

export type ExactSegment = { length: number; seebeck: number; sigma: number; kappa: number };

/**
 * Constant-property segments solved exactly. In a segment κT'' = −J²/σ, so T
 * is a parabola; q = STJ − κT' and dq/dx = J²/σ + JST' integrate to
 *   T(l) = T0 + T'(0)·l − J²l²/(2σκ),   q(l) = q0 + J²l/σ + JS(T(l) − T0),
 * with T'(0) = (S·T0·J − q0)/κ. T and q carry over each interface. T(L) is
 * affine in Tc, so two evaluations give Tc exactly.
 */
export function exactSegmentsColdSide(segments: readonly ExactSegment[], currentDensity: number, hotSide: number, coldFlux: number): { coldSide: number; hotFlux: number } {
  const J = currentDensity;
  const run = (tc: number) => {
    let T = tc;
    let q = coldFlux;
    for (const s of segments) {
      const slope = (s.seebeck * T * J - q) / s.kappa;
      const T1 = T + slope * s.length - (J * J * s.length * s.length) / (2 * s.sigma * s.kappa);
      q = q + (J * J * s.length) / s.sigma + J * s.seebeck * (T1 - T);
      T = T1;
    }
    return { T, q };
  };
  const a = run(100);
  const b = run(200);
  const coldSide = 100 + ((hotSide - a.T) * 100) / (b.T - a.T);
  return { coldSide, hotFlux: run(coldSide).q };
}

/**
 * Tc of a uniform constant-property leg from Ioffe's balance (A. F. Ioffe,
 * Semiconductor Thermoelements and Thermoelectric Cooling, 1957):
 * Qc = S·I·Tc − ½I²R − K(Th − Tc) ⇒ Tc = (Qc + ½I²R + K·Th)/(S·I + K).
 */
export function ioffeColdSide(leg: ExactSegment & { area: number }, current: number, hotSide: number, heatLoad: number): number {
  const R = leg.length / (leg.sigma * leg.area);
  const K = (leg.kappa * leg.area) / leg.length;
  return (heatLoad + 0.5 * current * current * R + K * hotSide) / (leg.seebeck * current + K);
}
