import type { RunDetail } from '@/shared/api/runs';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { chartMarks } from '@/components/theme';
import { doping, formatObjective, objectiveInfo, quantity, sweepNote } from './run-format';
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
  return details.map((detail, i) => {
    const parsed = parseRunResult(detail.result);
    const swept = sweepNote(detail);
    return { detail, result: parsed?.ok ? parsed.result : null, label: `Run ${i + 1}`, note: swept ? `${detail.run.designName}, ${swept}` : detail.run.designName };
  });
}

type Row = { key: string; label: string; cells: string[] };

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
    row('objective', 'Objective', (c) => objectiveInfo[c.detail.design.objective].goal),
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
    row('geometry', 'L × A', (c) => `${quantity(c.detail.design.lengthMm, 'mm')} × ${quantity(c.detail.design.areaMm2, 'mm²')}`),
    row('bounds', 'Doping bounds', (c) => `${doping(c.detail.design.minPerCm3)} – ${doping(c.detail.design.maxPerCm3)}`),
    row('nodes', 'Control points', (c) => `${c.detail.design.controlPoints}${c.detail.design.monotone ? ', monotone' : ''}`),
    row('family', 'Family', (c) => `${c.detail.design.familyName} v${c.detail.familyVersion}`),
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
