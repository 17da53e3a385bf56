import { coolerResultOf } from '../shared/runs/cooler-results';

const num = (v: number | null | undefined, digits: number): string => (typeof v === 'number' && Number.isFinite(v) ? v.toFixed(digits) : '—');
/** Watts small enough for a detector's load read better in mW. */
const watts = (v: number): string => (Math.abs(v) < 0.1 ? `${num(v * 1e3, 2)} mW` : `${num(v, 3)} W`);

const objectiveWords: Record<string, string> = { maxDeltaT: 'largest ΔT', maxHeatLoad: 'largest heat load', maxCop: 'best COP', minPower: 'least input power' };

/**
 * The headline of a couple or cascade run's result in the trade's units, for
 * the run-finished mail: a cascade's cold side, ΔT, power and COP and each
 * stage; a couple's ΔT, heat load, COP, area ratio and what one shared
 * current costs against powering each leg on its own.
 */
export function coolerHeadline(kind: string, result: unknown): { subject: string; lines: string[] } | null {
  const parsed = coolerResultOf(kind, result);
  if (!parsed) return null;
  if (parsed.kind === 'cascade') {
    const r = parsed.result;
    return {
      subject: `cold side ${num(r.coldSide, 1)} K, ΔT ${num(r.deltaT, 1)} K`,
      lines: [
        `Optimised for the ${objectiveWords[r.objective] ?? r.objective}, ${r.stages.length} stages wired ${r.wiring === 'series' ? 'in series on one supply' : 'on one supply each'}.`,
        `cold side ${num(r.coldSide, 2)} K, hot side ${num(r.hotSide, 2)} K, ΔT ${num(r.deltaT, 2)} K at a heat load of ${watts(r.heatLoad)}`,
        `input power ${num(r.power, 3)} W, COP ${num(r.cop, 4)}`,
        ...r.stages.map((s, i) => `stage ${i + 1}${i === 0 ? ' (coldest)' : ''}: ${s.couples} couple${s.couples === 1 ? '' : 's'}, ${num(s.coldSide, 1)}–${num(s.hotSide, 1)} K, ${num(s.current, 3)} A, ${num(s.voltage, 3)} V, ${num(s.power, 3)} W`),
      ],
    };
  }
  const r = parsed.result;
  const cost = r.mismatch.unit === '' ? `${num(r.mismatch.cost, 4)} of COP` : `${num(r.mismatch.cost, r.mismatch.unit === 'K' ? 2 : 4)} ${r.mismatch.unit}`;
  return {
    subject: `ΔT ${num(r.deltaT, 1)} K`,
    lines: [
      `Optimised for the ${objectiveWords[r.objective.kind] ?? r.objective.kind}.`,
      `ΔT ${num(r.deltaT, 2)} K (cold side ${num(r.coldSide, 2)} K, hot side ${num(r.hotSide, 2)} K), heat load ${watts(r.heatLoad)} per couple, COP ${num(r.cop, 4)}`,
      `current ${num(r.current, 3)} A, voltage ${num(r.voltage, 4)} V, input power ${num(r.power, 4)} W per couple`,
      `area ratio A_n / A_p ${num(r.areaRatio, 3)}; one shared current costs ${cost} against powering each leg at its own best`,
    ],
  };
}
