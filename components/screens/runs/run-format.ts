import type { Objective } from '@/shared/api/designs';
import type { RunDetail, RunSummary, Sweep } from '@/shared/api/runs';
import { formatDateTime } from '@/components/format/date';
import { formatNumber, formatScientific, withUnit } from '@/components/format/number';

export type ObjectiveInfo = {
  /** What the optimiser looks for, in words. */
  goal: string;
  /** The quantity it maximises, e.g. "ΔT". */
  symbol: string;
  unit: string;
};

export const objectiveInfo: Record<Objective, ObjectiveInfo> = {
  maxDeltaT: { goal: 'Largest temperature drop', symbol: 'ΔT', unit: 'K' },
  maxHeatLoad: { goal: 'Largest heat load', symbol: 'Qc', unit: 'W' },
  maxCop: { goal: 'Best COP', symbol: 'COP', unit: '' },
};

/** The objective of a stored run (a string in the summary) as one of the known three. */
export function asObjective(text: string): Objective {
  return text === 'maxHeatLoad' || text === 'maxCop' ? text : 'maxDeltaT';
}

/** "87.3 K", "0.125 W", "0.42" (COP has no unit); "–" when there is no value yet. */
export function formatObjective(objective: Objective, value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined) return '–';
  return withUnit(formatNumber(value, digits), objectiveInfo[objective].unit);
}

/** A value with its unit, plain for the usual magnitudes: "1.5 mm". */
export function quantity(value: number | null | undefined, unit: string, digits = 4): string {
  if (value === null || value === undefined) return '–';
  return withUnit(formatNumber(value, digits), unit);
}

/** Doping in the trade's notation: "1.2 × 10¹⁹ cm⁻³". */
export function doping(perCm3: number): string {
  return withUnit(formatScientific(perCm3), 'cm⁻³');
}

/** "0.8 s", "42.3 s", "3 min 05 s", "2 h 14 min". */
export function formatDuration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '–';
  if (seconds < 59.95) return `${seconds.toFixed(1)} s`;
  const whole = Math.round(seconds);
  const minutes = Math.floor(whole / 60);
  if (minutes < 60) return `${minutes} min ${String(whole % 60).padStart(2, '0')} s`;
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/** Seconds between two ISO times, or null when either is missing. */
export function secondsBetween(from: string | null, to: string | null): number | null {
  if (!from || !to) return null;
  const s = (Date.parse(to) - Date.parse(from)) / 1000;
  return Number.isFinite(s) ? s : null;
}

export type SweepParameter = Sweep['parameter'];

export type ParameterInfo = { label: string; symbol: string; unit: string; help: string; scale: 'linear' | 'log' };

/** The design parameters a sweep can vary, with the units the values are entered in. */
export const sweepParameterInfo: Record<SweepParameter, ParameterInfo> = {
  hotSide: { label: 'Hot-side temperature', symbol: 'Th', unit: 'K', help: 'e.g. 280, 290, 300, 310', scale: 'linear' },
  lengthMm: { label: 'Leg length', symbol: 'L', unit: 'mm', help: 'e.g. 0.8, 1.2, 1.6, 2.0', scale: 'linear' },
  heatLoad: { label: 'Heat load', symbol: 'Qc', unit: 'W', help: 'e.g. 0, 0.005, 0.01, 0.02', scale: 'linear' },
  maxPerCm3: { label: 'Upper doping bound', symbol: 'n max', unit: 'cm⁻³', help: 'e.g. 5e19, 1e20, 2e20', scale: 'log' },
  minPerCm3: { label: 'Lower doping bound', symbol: 'n min', unit: 'cm⁻³', help: 'e.g. 1e17, 1e18, 5e18', scale: 'log' },
};

/** A swept value with its unit ("300 K", "1 × 10²⁰ cm⁻³"). */
export function formatSweepValue(parameter: SweepParameter, value: number): string {
  return sweepParameterInfo[parameter].scale === 'log' ? doping(value) : quantity(value, sweepParameterInfo[parameter].unit);
}

/**
 * "Th = 300 K" for a run of a sweep: the swept parameter is the one whose
 * value in the run's frozen design equals the run's sweep value.
 */
export function sweepNote(detail: Pick<RunDetail, 'run' | 'design'>): string | null {
  const { run, design: d } = detail;
  if (!run.sweepId || run.sweepValue === null) return null;
  const values: Record<SweepParameter, number> = { hotSide: d.hotSide, lengthMm: d.lengthMm, heatLoad: d.heatLoad, maxPerCm3: d.maxPerCm3, minPerCm3: d.minPerCm3 };
  const parameter = (Object.keys(values) as SweepParameter[]).find((p) => values[p] === run.sweepValue);
  return parameter ? `${sweepParameterInfo[parameter].symbol} = ${formatSweepValue(parameter, run.sweepValue)}` : 'a sweep run';
}

/** "Run 12": the team's short number for a run. */
export function runName(r: Pick<RunSummary, 'number'>): string {
  return `Run ${r.number}`;
}

/** "16 starts", "1 start". */
export function startsText(starts: number): string {
  return `${starts} ${starts === 1 ? 'start' : 'starts'}`;
}

/** What tells two runs of one design apart: "4 Dec 2026, 14:05 UTC · 150 starts · Piet Okafor". */
export function runProvenance(r: Pick<RunSummary, 'createdAt' | 'starts' | 'launchedBy'>): string {
  return `${formatDateTime(r.createdAt)} · ${startsText(r.starts)} · ${r.launchedBy}`;
}

/** "Run 12 · Detector p-leg": a run named in a heading, link or legend. */
export function runTitle(r: Pick<RunSummary, 'number' | 'designName'>): string {
  return `${runName(r)} · ${r.designName}`;
}

/** A finished run in a picker: "Run 12 · Detector p-leg · ΔT 87.3 K · 1 Dec 2026, 14:05 UTC · 150 starts · Piet Okafor". */
export function runChoiceLabel(r: RunSummary): string {
  const o = asObjective(r.objective);
  return `${runTitle(r)} · ${objectiveInfo[o].symbol} ${formatObjective(o, r.best, 3)} · ${runProvenance(r)}`;
}

/** "next in line" or "number 4 in line", for a queued run. */
export function placeInLine(position: number): string {
  return position === 1 ? 'next in line' : `number ${position} in line`;
}
