import type { CascadeRunResult, CoolerRunDetail } from '@/shared/api/coolers';
import type { NumbersHead, NumbersRow } from '@/components/screens/runs/numbers-table';
import { quantity, runName, startsText } from '@/components/screens/runs/run-format';
import { formatDateTime } from '@/components/format/date';
import { formatNumber } from '@/components/format/number';
import { cascadeObjectiveGoal, heatFlow } from './cooler-format';
import { parseCoolerResult } from './cooler-result';

export type ComparedCascade = { detail: CoolerRunDetail; result: CascadeRunResult | null };

/** The cascade runs among the loaded details, each with its result when it has one. */
export function comparedCascades(details: readonly CoolerRunDetail[]): ComparedCascade[] {
  return details
    .filter((d) => d.run.kind === 'cascade')
    .map((detail) => {
      const parsed = parseCoolerResult('cascade', detail.result);
      return { detail, result: parsed?.ok && parsed.kind === 'cascade' ? parsed.result : null };
    });
}

export function cascadeHeads(list: readonly ComparedCascade[]): NumbersHead[] {
  return list.map((c) => ({ key: c.detail.run.id, label: runName(c.detail.run), note: c.detail.cooler.name }));
}

type RowDef = { key: string; label: string; cell: (c: ComparedCascade) => string };
const res = (f: (r: CascadeRunResult) => string) => (c: ComparedCascade) => (c.result ? f(c.result) : '–');

/** Results first (stage counts, temperatures, power, COP), then the settings each run was launched with. */
const rowDefs: RowDef[] = [
  { key: 'stages', label: 'Stages', cell: res((r) => String(r.stages.length)) },
  { key: 'couples', label: 'Couples per stage', cell: res((r) => `${r.stages.map((s) => s.couples).join(' / ')} (coldest first)`) },
  { key: 'coldSide', label: 'Cold side Tc', cell: res((r) => quantity(r.coldSide, 'K')) },
  { key: 'deltaT', label: 'ΔT', cell: res((r) => quantity(r.deltaT, 'K')) },
  { key: 'heatLoad', label: 'Heat load Qc', cell: res((r) => heatFlow(r.heatLoad)) },
  { key: 'power', label: 'Total power', cell: res((r) => quantity(r.power, 'W')) },
  { key: 'cop', label: 'COP', cell: res((r) => (r.cop === null ? '–' : formatNumber(r.cop, 3))) },
  { key: 'currents', label: 'Currents', cell: res((r) => r.stages.map((s) => quantity(s.current, 'A', 3)).join(' / ')) },
  { key: 'objective', label: 'Objective', cell: (c) => cascadeObjectiveGoal[c.result?.objective ?? 'maxDeltaT'] },
  { key: 'hotSide', label: 'Heat sink Th', cell: (c) => quantity(c.detail.cooler.input.hotSide, 'K') },
  { key: 'wiring', label: 'Wiring', cell: (c) => (c.result?.wiring === 'separate' ? 'one supply per stage' : 'series, one supply') },
  { key: 'search', label: 'Search', cell: (c) => startsText(c.detail.run.starts) },
  { key: 'launched', label: 'Launched', cell: (c) => `${formatDateTime(c.detail.run.createdAt)} by ${c.detail.run.launchedBy}` },
  { key: 'engine', label: 'Engine version', cell: (c) => c.detail.engineVersion },
];

export function cascadeRows(list: readonly ComparedCascade[]): NumbersRow[] {
  return rowDefs.map((d) => ({ key: d.key, label: d.label, cells: list.map(d.cell) }));
}
