import type { ModuleDesign, ModuleSummary } from '@/shared/api/modules';
import { moduleCurve, parseModuleCase, type OperatingCurve } from '@/shared/engine';
import type { PlotSeries } from '@/components/charts/series-plot-types';
import { formatNumber } from '@/components/format/number';
import { chartMarks } from '@/components/theme';
import { legSourceWords } from '@/components/screens/modules/module-words';
import { quantity } from './run-format';

/** One module of the comparison: its curve versus current at its own ΔT, or why there is none. */
export type ComparedModule = { module: ModuleDesign; label: string; curve: OperatingCurve | null; problem: string | null };

/**
 * The curve versus current only (not the ΔT sweep or the N trade): a few
 * tens of milliseconds per module, so four fit in one render.
 */
export function comparedModules(modules: ModuleDesign[]): ComparedModule[] {
  return modules.map((module, i) => ({ module, label: `Module ${i + 1}`, ...curveOf(module) }));
}

/**
 * One computation per fetched module: React Query hands back the same object
 * until the module changes, so re-renders (focus, refetch) cost nothing.
 */
const computed = new WeakMap<ModuleDesign, Pick<ComparedModule, 'curve' | 'problem'>>();

function curveOf(module: ModuleDesign): Pick<ComparedModule, 'curve' | 'problem'> {
  const known = computed.get(module);
  if (known) return known;
  let out: Pick<ComparedModule, 'curve' | 'problem'>;
  try {
    const c = parseModuleCase(module.case);
    out = { curve: moduleCurve(c.module, c.conditions, c.options), problem: null };
  } catch (error) {
    out = { curve: null, problem: error instanceof Error ? error.message : String(error) };
  }
  computed.set(module, out);
  return out;
}

type Row = { key: string; label: string; cells: string[] };

const at = (value: string, current: number) => `${value} at ${quantity(current, 'A')}`;

/** The modules' numbers: one column per module, one row per quantity, every value with its unit. */
export function moduleCompareRows(list: ComparedModule[], summaries: readonly ModuleSummary[] = []): Row[] {
  const names = new Map(summaries.map((s) => [s.id, s.sourceNames]));
  const row = (key: string, label: string, cell: (c: ComparedModule) => string): Row => ({ key, label, cells: list.map(cell) });
  const curve = (f: (c: OperatingCurve) => string) => (m: ComparedModule) => (m.curve ? f(m.curve) : '–');
  const limit = (c: OperatingCurve) => {
    if (c.currentLimit === null) return 'none';
    const over = c.maxHeatLoad.overLimit ? ', maximum-Qc current over it' : '';
    return `${quantity(c.currentLimit, 'A')}${over}`;
  };
  return [
    row('name', 'Module', (m) => m.module.name),
    row('couples', 'Couples N', (m) => String(m.module.input.couples ?? 1)),
    row('p', 'p-type leg', (m) => legSourceWords(m.module.input.p, names.get(m.module.id)?.p ?? '(name not loaded)')),
    row('n', 'n-type leg', (m) => legSourceWords(m.module.input.n, names.get(m.module.id)?.n ?? '(name not loaded)')),
    row('hotSide', 'Th', (m) => quantity(m.module.input.hotSide, 'K')),
    row('deltaT', 'ΔT', (m) => quantity(m.module.input.deltaT, 'K')),
    row('pumping', 'Pumps heat from', curve((c) => `${quantity(c.pumpingRange[0], 'A')} to ${quantity(c.pumpingRange[1], 'A')}`)),
    row('maxQc', 'Maximum Qc', curve((c) => at(quantity(c.maxHeatLoad.heatLoad, 'W'), c.maxHeatLoad.current))),
    row('voltageAtMaxQc', 'Voltage at maximum Qc', curve((c) => quantity(c.maxHeatLoad.voltage, 'V'))),
    row('copAtMaxQc', 'COP at maximum Qc', curve((c) => (c.maxHeatLoad.cop === null ? '–' : formatNumber(c.maxHeatLoad.cop, 3)))),
    row('maxCop', 'Maximum COP', curve((c) => (c.maxCop?.cop == null ? 'none (ΔT = 0 K)' : at(formatNumber(c.maxCop.cop, 3), c.maxCop.current)))),
    row('qcAtMaxCop', 'Qc at maximum COP', curve((c) => (c.maxCop ? quantity(c.maxCop.heatLoad, 'W') : '–'))),
    row('limit', 'Current limit', curve(limit)),
    // Only when a module has no curves (its legs changed beyond what the engine accepts): say why.
    ...(list.some((m) => m.problem) ? [row('problem', 'No curves because', (m) => m.problem ?? '–')] : []),
  ];
}

/** One curve per module of Qc or COP versus current. */
export function moduleCompareSeries(list: ComparedModule[], quantityKey: 'heatLoad' | 'cop'): PlotSeries[] {
  return list.flatMap((m, i) => {
    const c = m.curve;
    if (!c) return [];
    const ys = c[quantityKey];
    const line = c.currents.flatMap((x, k) => {
      const y = ys[k];
      return y !== null && Number.isFinite(y) ? [{ x, y }] : [];
    });
    return [{ key: m.module.id, label: `${m.label} · ${m.module.name}`, mark: chartMarks[i % chartMarks.length], line }];
  });
}
