import type { CascadeInput, CoolerInput, CoolerKind, CoolerSummary } from '@/shared/api/coolers';
import type { RunKind } from '@/shared/api/runs';
import { formatNumber, withUnit } from '@/components/format/number';
import { objectiveInfo, quantity } from '@/components/screens/runs/run-format';

/** A heat flow in the unit a detector team reads it in: "4.8 mW" below a watt, "1.25 W" above. */
export function heatFlow(watts: number | null | undefined, digits = 3): string {
  if (watts === null || watts === undefined || !Number.isFinite(watts)) return '–';
  return Math.abs(watts) < 1 ? withUnit(formatNumber(watts * 1000, digits), 'mW') : withUnit(formatNumber(watts, digits), 'W');
}

export const coolerKindLabel: Record<CoolerKind, string> = { couple: 'Matched couple', cascade: 'Cascade' };

/** The kind of a run in a list: "Leg", "Matched couple", "Cascade". */
export const runKindLabel: Record<RunKind, string> = { leg: 'Leg', ...coolerKindLabel };

export const cascadeObjectiveGoal: Record<NonNullable<CascadeInput['objective']>, string> = {
  maxDeltaT: 'Largest ΔT at the heat load',
  minPower: 'Least input power at the cold side and heat load',
};

/** What a cooler's optimiser looks for, in words. */
export function coolerGoal(input: CoolerInput): string {
  if (input.kind === 'cascade') return cascadeObjectiveGoal[input.objective ?? 'maxDeltaT'];
  return objectiveInfo[input.objective ?? 'maxDeltaT'].goal;
}

/** "3 stages · 8 / 24 / 72 couples · Th 300 K · Qc 5 mW · series" or "Th 300 K · Qc 0 mW per couple · A_n/A_p free". */
export function coolerSettingsWords(input: CoolerInput): string {
  const parts = [`Th ${quantity(input.hotSide, 'K')}`];
  if (input.kind === 'cascade') {
    const counts = input.stages.map((s) => s.couples).join(' / ');
    parts.unshift(`${input.stages.length} ${input.stages.length === 1 ? 'stage' : 'stages'}`, `${counts} couples${input.couplesLimit ? ' (optimised)' : ''}`);
    parts.push(`Qc ${heatFlow(input.heatLoad ?? 0)}`);
    if (input.objective === 'minPower' && input.coldSide !== undefined) parts.push(`Tc ${quantity(input.coldSide, 'K')}`);
    parts.push(input.wiring === 'separate' ? 'one supply per stage' : 'stages in series');
    return parts.join(' · ');
  }
  if (input.objective === 'maxDeltaT' || input.objective === undefined) parts.push(`Qc ${heatFlow(input.heatLoad ?? 0)} per couple`);
  else if (input.coldSide !== undefined) parts.push(`Tc ${quantity(input.coldSide, 'K')}`);
  parts.push(input.areaRatio === undefined ? 'A_n/A_p free' : `A_n/A_p ${formatNumber(input.areaRatio, 3)}`);
  return parts.join(' · ');
}

/** The latest run's headline in a list: "Run 4 · ΔT 96.2 K · 0.84 W". */
export function latestRunWords(latest: NonNullable<CoolerSummary['latestRun']>): string {
  const parts = [`Run ${latest.number}`];
  if (latest.deltaT !== null) parts.push(`ΔT ${quantity(latest.deltaT, 'K')}`);
  if (latest.power !== null) parts.push(`P ${quantity(latest.power, 'W')}`);
  return parts.join(' · ');
}

/** A stored run's objective string when it is a cooler's ("minPower" has no leg counterpart). */
export function coolerBestWords(objective: string, best: number | null, finished: boolean): string {
  const prefix = finished ? 'Best' : 'Best so far';
  if (objective === 'minPower') return `${finished ? 'Least' : 'Least so far'} power P ${quantity(best, 'W')}`;
  if (objective === 'maxHeatLoad') return `${prefix} Qc ${heatFlow(best)}`;
  if (objective === 'maxCop') return `${prefix} COP ${quantity(best, '')}`;
  return `${prefix} ΔT ${quantity(best, 'K')}`;
}
