/**
 * Integrates the steady leg equations from the cold end in the state (T, q):
 *
 *   dT/dx = (S·T·J − q)/κ
 *   dq/dx = J²/σ + J·S·dT/dx
 *   dV/dx = J/σ + S·dT/dx        (voltage, for the energy-balance check)
 *
 * with an embedded Dormand–Prince 5(4) Runge–Kutta pair and error control
 * ("A family of embedded Runge–Kutta formulae", J. Comput. Appl. Math. 6,
 * 19 (1980)). Why our own integrator rather than odex: the leg equations
 * change at every section boundary, need to stop on exact points and to
 * detect temperatures leaving a family's range, and the solver calls this
 * ~10⁴ times per optimisation, so it is written allocation-free for this one
 * 3-state system. odex (Gragg–Bulirsch–Stoer) is used in the tests as the
 * independent cross-check.
 * Constant-property sections have a polynomial solution (the system matrix
 * is nilpotent), which a fifth-order step reproduces exactly.
 *
 * Contacts (leg.ends.contacts = {cold, hot} ρc): each end is a junction of
 * zero thickness with resistance ρc/A and no temperature drop. Its Joule heat
 * J²ρc per unit area is released at the junction, so q jumps by J²ρc_cold at
 * x = 0 (the heat entering the leg is the heat drawn from the load plus the
 * cold contact's Joule heat) and by J²ρc_hot at x = L, and V by J·ρc at each
 * end. The coldFlux argument and the returned flux and voltage are then the
 * junction-side values: Qc/A, Qh/A and the voltage across leg and contacts.
 *
 * Parasitic heat (leg.ends.parasitic): a fixed load Qp onto the cold junction
 * adds Qp/A to the jump at x = 0; radiation from surroundings at Ts onto the
 * sides is a distributed source in the heat balance,
 *   dq/dx = J²/σ + J·S·dT/dx + ε·σ_SB·(P/A)·(Ts⁴ − T⁴),
 * positive (q grows towards the hot end) where the leg is colder than its
 * surroundings. `parasitic` returns the total per unit area (Qp/A + ∫ source
 * dx) so that Qh − Qc − parasitic·A = V·I still checks the energy balance.
 */
import { coldJump, radiationTerm } from './leg-ends';
import type { Leg, LegSection } from './leg-profile';
import type { Properties } from './material-family';

export type PointCallback = (x: number, temperature: number, flux: number, voltage: number, section: LegSection) => void;

export type IntegrationOptions = {
  /** Relative tolerance per step on T and q. */
  tolerance: number;
  /** Flux scale [W/m²] added to |q| in q's error weight (q passes through 0). */
  fluxScale: number;
  /** Called at every section start and end and at every stop point. */
  onPoint?: PointCallback;
  /** Absolute positions [m] where the integrator must land (sorted). */
  stops?: readonly number[];
  /** Step size carried between calls; updated on return. */
  stepHint?: { step: number };
  /**
   * Relative slack on the family's temperature range before a trial counts
   * as having left it.
   * @default 1e-12
   */
  rangeSlack?: number;
  /** Receives the end of every accepted step (for a later replay). */
  record?: number[];
  /**
   * Take exactly these steps (recorded on a neighbouring problem) without
   * error control. The result is then a smooth function of the start state
   * and the parameters, so finite differences of it are free of the
   * step-selection noise of adaptive integration ("internal numerical
   * differentiation"). Stops are ignored.
   */
  replay?: readonly number[];
};

export type IntegrationStatus = 'ok' | 'low' | 'high';

export type IntegrationResult = {
  /** 'low'/'high': the temperature left the family's range (or the step collapsed) at x. */
  status: IntegrationStatus;
  x: number;
  temperature: number;
  flux: number;
  voltage: number;
  /** Parasitic heat taken up by the leg per unit cross-section [W/m²]: fixed load / A + radiation absorbed by the sides. */
  parasitic: number;
  steps: number;
  rejected: number;
  evaluations: number;
};

// Dormand–Prince 5(4) tableau.
const A21 = 1 / 5;
const A31 = 3 / 40, A32 = 9 / 40;
const A41 = 44 / 45, A42 = -56 / 15, A43 = 32 / 9;
const A51 = 19372 / 6561, A52 = -25360 / 2187, A53 = 64448 / 6561, A54 = -212 / 729;
const A61 = 9017 / 3168, A62 = -355 / 33, A63 = 46732 / 5247, A64 = 49 / 176, A65 = -5103 / 18656;
const B1 = 35 / 384, B3 = 500 / 1113, B4 = 125 / 192, B5 = -2187 / 6784, B6 = 11 / 84;
const C2 = 1 / 5, C3 = 3 / 10, C4 = 4 / 5, C5 = 8 / 9;
// Error coefficients b − b̂.
const E1 = 71 / 57600, E3 = -71 / 16695, E4 = 71 / 1920, E5 = -17253 / 339200, E6 = 22 / 525, E7 = -1 / 40;

const SAFETY = 0.9;
const MAX_GROWTH = 5;
const MIN_SHRINK = 0.2;

// Scratch: stage derivatives of T, q, V (module-level: the integrator is not re-entrant).
const kT = new Float64Array(7);
const kq = new Float64Array(7);
const kV = new Float64Array(7);
const kW = new Float64Array(7);
const props: Properties = { seebeck: 0, sigma: 0, kappa: 0 };

export function integrateLeg(leg: Leg, currentDensity: number, coldTemperature: number, coldFlux: number, options: IntegrationOptions): IntegrationResult {
  const J = currentDensity;
  const rtol = options.tolerance;
  const fluxScale = options.fluxScale;
  const stops = options.stops ?? [];
  const onPoint = options.onPoint;
  const record = options.record;
  const slack = options.rangeSlack ?? 1e-12;
  const replay = options.replay;
  let replayIndex = 0;
  let h = options.stepHint?.step ?? leg.length / 16;
  let T = coldTemperature;
  let q = coldFlux;
  let V = 0;
  const coldContact = leg.ends?.contacts?.cold ?? 0;
  const hotContact = leg.ends?.contacts?.hot ?? 0;
  const fixedLoad = (leg.ends?.parasitic?.heatLoad ?? 0) / leg.area;
  q += coldJump(leg.ends, leg.area, J);
  V += J * coldContact;
  let W = 0; // radiation absorbed so far, per unit area
  const { coefficient: radiation, ts4 } = radiationTerm(leg.ends, leg.area);
  let steps = 0;
  let rejected = 0;
  let evaluations = 0;
  let stopIndex = 0;
  const minStep = 1e-13 * leg.length;

  let section = leg.sections[0];
  let slope = 0; // d log10 n / dx within the section
  let sectionStart = 0;

  // Right-hand side at (x, T, q) into stage k.
  const rhs = (k: number, x: number, t: number, flux: number): void => {
    section.family.properties(section.log10Start + slope * (x - sectionStart), t, props);
    const S = props.seebeck;
    const dT = (S * t * J - flux) / props.kappa;
    const joule = J / props.sigma;
    const t2 = t * t;
    const source = radiation === 0 ? 0 : radiation * (ts4 - t2 * t2);
    kT[k] = dT;
    kq[k] = J * joule + J * S * dT + source;
    kV[k] = joule + S * dT;
    kW[k] = source;
    evaluations++;
  };

  const finish = (status: IntegrationStatus, x: number): IntegrationResult => {
    if (options.stepHint) options.stepHint.step = h;
    return { status, x, temperature: T, flux: q, voltage: V, parasitic: fixedLoad + W, steps, rejected, evaluations };
  };

  for (const s of leg.sections) {
    section = s;
    sectionStart = s.start;
    slope = (s.log10End - s.log10Start) / (s.end - s.start);
    const low = Math.max(s.family.minTemperature, 1e-3);
    const high = s.family.maxTemperature;
    let x = s.start;
    onPoint?.(x, T, q, V, s);
    while (stopIndex < stops.length && stops[stopIndex] <= x) stopIndex++;
    rhs(0, x, T, q);
    while (x < s.end) {
      let target: number;
      let landing: boolean;
      if (replay) {
        if (replayIndex >= replay.length) throw new Error('integrateLeg: the replayed steps do not cover the leg');
        target = Math.min(replay[replayIndex++], s.end);
        landing = true;
      } else {
        target = stopIndex < stops.length && stops[stopIndex] < s.end ? stops[stopIndex] : s.end;
        landing = x + h >= target - 1e-12 * leg.length;
      }
      const wanted = h;
      const step = landing ? target - x : h;
      // Stages 2–7.
      rhs(1, x + C2 * step, T + step * A21 * kT[0], q + step * A21 * kq[0]);
      rhs(2, x + C3 * step, T + step * (A31 * kT[0] + A32 * kT[1]), q + step * (A31 * kq[0] + A32 * kq[1]));
      rhs(3, x + C4 * step, T + step * (A41 * kT[0] + A42 * kT[1] + A43 * kT[2]), q + step * (A41 * kq[0] + A42 * kq[1] + A43 * kq[2]));
      rhs(
        4,
        x + C5 * step,
        T + step * (A51 * kT[0] + A52 * kT[1] + A53 * kT[2] + A54 * kT[3]),
        q + step * (A51 * kq[0] + A52 * kq[1] + A53 * kq[2] + A54 * kq[3]),
      );
      rhs(
        5,
        x + step,
        T + step * (A61 * kT[0] + A62 * kT[1] + A63 * kT[2] + A64 * kT[3] + A65 * kT[4]),
        q + step * (A61 * kq[0] + A62 * kq[1] + A63 * kq[2] + A64 * kq[3] + A65 * kq[4]),
      );
      const Tn = T + step * (B1 * kT[0] + B3 * kT[2] + B4 * kT[3] + B5 * kT[4] + B6 * kT[5]);
      const qn = q + step * (B1 * kq[0] + B3 * kq[2] + B4 * kq[3] + B5 * kq[4] + B6 * kq[5]);
      rhs(6, x + step, Tn, qn);
      const errT = step * (E1 * kT[0] + E3 * kT[2] + E4 * kT[3] + E5 * kT[4] + E6 * kT[5] + E7 * kT[6]);
      const errQ = step * (E1 * kq[0] + E3 * kq[2] + E4 * kq[3] + E5 * kq[4] + E6 * kq[5] + E7 * kq[6]);
      let err = Math.max(Math.abs(errT) / (rtol * Math.max(Math.abs(T), Math.abs(Tn))), Math.abs(errQ) / (rtol * (Math.max(Math.abs(q), Math.abs(qn)) + fluxScale)));
      if (!(err === err) || !(Tn > 0)) err = Infinity; // NaN or a non-physical stage: reject
      if (replay && !(Tn > 0)) return finish('low', x);
      if (err <= 1 || replay) {
        const Vn = V + step * (B1 * kV[0] + B3 * kV[2] + B4 * kV[3] + B5 * kV[4] + B6 * kV[5]);
        if (radiation !== 0) W += step * (B1 * kW[0] + B3 * kW[2] + B4 * kW[3] + B5 * kW[4] + B6 * kW[5]);
        x = landing ? target : x + step;
        T = Tn;
        q = qn;
        V = Vn;
        steps++;
        record?.push(x);
        kT[0] = kT[6];
        kq[0] = kq[6];
        kV[0] = kV[6];
        kW[0] = kW[6];
        const growth = err === 0 ? MAX_GROWTH : Math.min(MAX_GROWTH, Math.max(MIN_SHRINK, SAFETY * Math.pow(err, -0.2)));
        // After a step shortened to land on a point, resume with the step we
        // wanted: growing it by the short step's (small) error overshoots.
        h = landing && step < wanted ? wanted : step * growth;
        if (T < low * (1 - slack)) return finish('low', x);
        if (T > high * (1 + slack)) return finish('high', x);
        if (!replay && landing && target < s.end) {
          onPoint?.(x, T, q, V, s);
          stopIndex++;
        }
      } else {
        rejected++;
        h = step * (err === Infinity ? MIN_SHRINK : Math.max(MIN_SHRINK, SAFETY * Math.pow(err, -0.2)));
        if (h < minStep) return finish(kT[0] < 0 ? 'low' : 'high', x);
      }
    }
    onPoint?.(x, T, q, V, s);
  }
  q += J * J * hotContact;
  V += J * hotContact;
  return finish('ok', leg.length);
}
