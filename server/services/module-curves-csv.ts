import type { ModuleCsvVersus } from '../../shared/api';
import { moduleCurve, moduleDeltaTCurve, parseModuleCase, type CurveSamples } from '../../shared/engine';
import { csvComment, csvDocument, type CsvCell } from './csv-writer';

export type CurvesCsvInput = { name: string; resolvedCase: unknown; versus: ModuleCsvVersus };

/** Six significant digits: a number cell, or empty where the engine has none. */
const n = (v: number | null | undefined): number | null => (typeof v === 'number' && Number.isFinite(v) ? Number(v.toPrecision(6)) : null);
/** The same, in a comment's words. */
const f = (v: number | null | undefined): string => String(n(v) ?? '');

const columns = ['current_A', 'heat_load_W', 'heat_rejected_W', 'voltage_V', 'power_W', 'cop', 'over_current_limit'];

/** One CSV row per sample, with `first` (the ΔT of each sample) in front when given. */
const csvRows = (curve: CurveSamples, first?: number[]): CsvCell[][] =>
  curve.currents.map((i, k) => [...(first ? [n(first[k])] : []), n(i), n(curve.heatLoad[k]), n(curve.heatRejected[k]), n(curve.voltage[k]), n(curve.power[k]), n(curve.cop[k]), curve.overLimit[k] ? 'yes' : 'no']);

/** A saved module's curve versus current (at its ΔT) or versus ΔT (each at its max-Qc current) as CSV, computed with the engine. */
export function moduleCurvesCsv({ name, resolvedCase, versus }: CurvesCsvInput): { filename: string; body: string } {
  const c = parseModuleCase(resolvedCase);
  const caution = [
    csvComment('Frostgrade module', name),
    csvComment(`${c.module.couples ?? 1} couples; model prediction to verify by measurement; modules run at high currents and their hot side can burn`),
  ];
  const slug = name.replace(/[^A-Za-z0-9._-]+/g, '-');
  if (versus === 'deltaT') {
    const d = moduleDeltaTCurve(c.module, { hotSide: c.conditions.hotSide }, c.deltaT);
    const end = d.deltaTMax;
    const comments = [...caution, csvComment(`hot side ${f(d.hotSide)} K; each ΔT at its current of maximum heat load`), csvComment(`maximum ΔT ${f(end.hotSide - end.coldSide)} K at ${f(end.current)} A`)];
    return { filename: `module-${slug}-versus-deltaT.csv`, body: csvDocument({ comments, header: ['delta_T_K', ...columns], rows: csvRows(d, d.deltaT) }) };
  }
  const curve = moduleCurve(c.module, c.conditions, c.options);
  const marks = [csvComment(`maximum heat load ${f(curve.maxHeatLoad.heatLoad)} W at ${f(curve.maxHeatLoad.current)} A`), ...(curve.maxCop ? [csvComment(`maximum COP ${f(curve.maxCop.cop)} at ${f(curve.maxCop.current)} A`)] : [])];
  const comments = [...caution, csvComment(`ΔT ${f(curve.deltaT)} K; hot side ${f(curve.hotSide)} K`), ...marks];
  return { filename: `module-${slug}.csv`, body: csvDocument({ comments, header: columns, rows: csvRows(curve) }) };
}
