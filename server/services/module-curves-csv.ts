import type { ModuleCsvVersus } from '../../shared/api';
import { moduleCurve, moduleDeltaTCurve, parseModuleCase, type CurveSamples } from '../../shared/engine';

export type CurvesCsvInput = { name: string; resolvedCase: unknown; versus: ModuleCsvVersus };

const f = (v: number | null | undefined): string => (typeof v === 'number' && Number.isFinite(v) ? Number(v.toPrecision(6)).toString() : '');

/** One CSV line per sample, with `first` (the ΔT of each sample) in front when given. */
const csvRows = (curve: CurveSamples, first?: number[]) =>
  curve.currents.map((i, k) => [...(first ? [f(first[k])] : []), f(i), f(curve.heatLoad[k]), f(curve.heatRejected[k]), f(curve.voltage[k]), f(curve.power[k]), f(curve.cop[k]), curve.overLimit[k] ? 'yes' : 'no'].join(','));

/** A saved module's curve versus current (at its ΔT) or versus ΔT (each at its max-Qc current) as CSV, computed with the engine. */
export function moduleCurvesCsv({ name, resolvedCase, versus }: CurvesCsvInput): { filename: string; body: string } {
  const c = parseModuleCase(resolvedCase);
  const columns = 'current_A,heat_load_W,heat_rejected_W,voltage_V,power_W,cop,over_current_limit';
  const caution = `# Frostgrade module "${name}": ${c.module.couples ?? 1} couples; model prediction, verify by measurement; modules run at high currents and their hot side can burn`;
  const slug = name.replace(/[^A-Za-z0-9._-]+/g, '-');
  if (versus === 'deltaT') {
    const d = moduleDeltaTCurve(c.module, { hotSide: c.conditions.hotSide }, c.deltaT);
    const end = d.deltaTMax;
    const lines = [caution, `# hot side ${f(d.hotSide)} K; each ΔT at its current of maximum heat load`, `# maximum ΔT ${f(end.hotSide - end.coldSide)} K at ${f(end.current)} A`, `delta_T_K,${columns}`, ...csvRows(d, d.deltaT)];
    return { filename: `module-${slug}-versus-deltaT.csv`, body: `${lines.join('\n')}\n` };
  }
  const curve = moduleCurve(c.module, c.conditions, c.options);
  const marks = [`# maximum heat load ${f(curve.maxHeatLoad.heatLoad)} W at ${f(curve.maxHeatLoad.current)} A`, ...(curve.maxCop ? [`# maximum COP ${f(curve.maxCop.cop)} at ${f(curve.maxCop.current)} A`] : [])];
  const lines = [caution, `# ΔT ${f(curve.deltaT)} K, hot side ${f(curve.hotSide)} K`, ...marks, columns, ...csvRows(curve)];
  return { filename: `module-${slug}.csv`, body: `${lines.join('\n')}\n` };
}
