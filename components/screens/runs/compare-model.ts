import type { RunDetail } from '@/shared/api/runs';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import { formatDateTime } from '@/components/format/date';
import { doping, formatObjective, objectiveInfo, quantity, runName, sweepNote } from './run-format';
import { runStateLook } from './run-state-badge';
import { parseRunResult, type RunResult } from './run-result';

/** As many runs as there are distinct line styles, so every curve reads without colour. */
export const maxCompared = chartMarks.length;

/** `list` with `id` ticked or unticked; a tick beyond `maxCompared` is ignored. */
export function toggled(list: readonly string[], id: string): string[] {
  return list.includes(id) ? list.filter((x) => x !== id) : list.length < maxCompared ? [...list, id] : [...list];
}

const idPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** `?ids=a,b,c` → distinct well-formed ids, at most `maxCompared`. */
export function parseIds(raw: string | string[] | undefined): string[] {
  const text = Array.isArray(raw) ? raw.join(',') : (raw ?? '');
  return [...new Set(text.split(',').map((s) => s.trim()).filter((s) => idPattern.test(s)))].slice(0, maxCompared);
}

/** `/runs/compare?ids=…&modules=…`, leaving out an empty list. */
export function compareHref(runIds: readonly string[], moduleIds: readonly string[]): string {
  const parts = [runIds.length ? `ids=${runIds.join(',')}` : '', moduleIds.length ? `modules=${moduleIds.join(',')}` : ''].filter(Boolean);
  return `/runs/compare${parts.length ? `?${parts.join('&')}` : ''}`;
}

export type Compared = { detail: RunDetail; result: RunResult | null; label: string; note: string };

export function compared(details: RunDetail[]): Compared[] {
  return details.map((detail) => {
    const parsed = parseRunResult(detail.result);
    const swept = sweepNote(detail);
    return { detail, result: parsed?.ok ? parsed.result : null, label: runName(detail.run), note: swept ? `${detail.run.designName}, ${swept}` : detail.run.designName };
  });
}

type Row = { key: string; label: string; cells: string[] };
type RowDef = { key: string; label: string; cell: (c: Compared) => string };

const yesNo = (on: boolean) => (on ? 'yes' : 'no');

/** "Th 300 K, ΔT maximised" / "Th 300 K, Tc 270 K": the conditions the run was searched at. */
function conditions(c: Compared): string {
  const d = c.detail.design;
  const parts = [`Th ${quantity(d.hotSide, 'K')}`];
  if (d.objective !== 'maxDeltaT' && d.coldSide !== null) parts.push(`Tc ${quantity(d.coldSide, 'K')}`);
  if (d.objective !== 'maxHeatLoad') parts.push(`Qc ${quantity(d.heatLoad, 'W')}`);
  return parts.join(', ');
}

function ends(c: Compared): string {
  const d = c.detail.design;
  const contacts = d.coldContactMicroOhmCm2 > 0 || d.hotContactMicroOhmCm2 > 0 ? `contacts ${quantity(d.coldContactMicroOhmCm2, 'µΩ·cm²')} cold, ${quantity(d.hotContactMicroOhmCm2, 'µΩ·cm²')} hot` : 'ideal contacts';
  const parasitic = d.parasitic === 'fixed' ? `parasitic ${quantity(d.parasiticLoadW, 'W')}` : d.parasitic === 'radiation' ? `radiation, ε ${quantity(d.emissivity, '')}` : 'no parasitic heat';
  return `${contacts}; ${parasitic}`;
}

/** The search each run froze when it was launched: what makes a 3-start and a 150-start run differ. */
const settingRows: RowDef[] = [
  { key: 'launched', label: 'Launched', cell: (c) => `${formatDateTime(c.detail.run.createdAt)} by ${c.detail.run.launchedBy}` },
  { key: 'starts', label: 'Search starts', cell: (c) => String(c.detail.run.starts) },
  { key: 'objective', label: 'Objective', cell: (c) => objectiveInfo[c.detail.design.objective].goal },
  { key: 'conditions', label: 'Searched at', cell: conditions },
  { key: 'bounds', label: 'Doping bounds', cell: (c) => `${doping(c.detail.design.minPerCm3)} – ${doping(c.detail.design.maxPerCm3)}` },
  { key: 'nodes', label: 'Control points', cell: (c) => String(c.detail.design.controlPoints) },
  { key: 'monotone', label: 'Monotone profile', cell: (c) => yesNo(c.detail.design.monotone) },
  { key: 'minZone', label: 'Minimum zone', cell: (c) => (c.detail.design.minZoneMm > 0 ? quantity(c.detail.design.minZoneMm, 'mm') : 'none') },
  { key: 'geometry', label: 'L × A', cell: (c) => `${quantity(c.detail.design.lengthMm, 'mm')} × ${quantity(c.detail.design.areaMm2, 'mm²')}` },
  { key: 'ends', label: 'Leg ends', cell: ends },
  { key: 'family', label: 'Family', cell: (c) => `${c.detail.design.familyName} v${c.detail.familyVersion}` },
  { key: 'engine', label: 'Engine version', cell: (c) => c.detail.engineVersion },
];

function gainOverUniform(c: Compared): string {
  const r = c.result;
  const u = r?.baselines?.uniform;
  if (!r || !u) return '–';
  const gain = r.objective.value - u.objective;
  return `${gain >= 0 ? '+' : ''}${formatObjective(c.detail.design.objective, gain, 3)}`;
}

/** The numbers table: one column per run, one row per quantity, every value with its unit. */
export function compareRows(list: Compared[]): Row[] {
  const row = (key: string, label: string, cell: (c: Compared) => string): Row => ({ key, label, cells: list.map(cell) });
  const res = (f: (r: RunResult) => string) => (c: Compared) => (c.result ? f(c.result) : '–');
  return [
    row('design', 'Design', (c) => c.detail.run.designName),
    row('state', 'State', (c) => runStateLook[c.detail.run.state].label),
    row('value', 'Optimum', (c) => (c.result ? `${objectiveInfo[c.detail.design.objective].symbol} ${formatObjective(c.detail.design.objective, c.result.objective.value)}` : '–')),
    row('gain', 'Gain over best uniform', gainOverUniform),
    row('deltaT', 'ΔT', res((r) => quantity(r.deltaT, 'K'))),
    row('coldSide', 'Tc', res((r) => quantity(r.coldSide, 'K'))),
    row('hotSide', 'Th', res((r) => quantity(r.hotSide, 'K'))),
    row('current', 'Current', res((r) => quantity(r.current, 'A'))),
    row('voltage', 'Voltage', res((r) => quantity(r.voltage, 'V'))),
    row('power', 'Input power', res((r) => quantity(r.power, 'W'))),
    row('heatLoad', 'Heat load Qc', res((r) => quantity(r.heatLoad, 'W'))),
    row('cop', 'COP', res((r) => (r.cop === null ? '–' : r.heatLoad === 0 ? '0 (no heat load)' : quantity(r.cop, '')))),
    ...settingRows.map((d) => row(d.key, d.label, d.cell)),
  ];
}

/** One curve per run of doping or temperature along the leg (position in mm). */
export function compareSeries(list: Compared[], quantity: 'doping' | 'temperature'): PlotSeries[] {
  return list.flatMap((c, i) => {
    const p = c.result?.profile;
    if (!p) return [];
    const ys = quantity === 'doping' ? p.perCm3 : p.temperature;
    if (!ys) return [];
    return [{ key: c.detail.run.id, label: `${c.label} · ${c.note}`, mark: chartMarks[i % chartMarks.length], line: p.x.map((x, k) => ({ x: x * 1e3, y: ys[k] })) }];
  });
}
