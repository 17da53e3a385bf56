import type { UploadIssue } from '../api/family-upload';
import type { Column, Quantity } from './csv-columns';
import { parseCell } from './parse-number';

/**
 * Values that parse and pass the engine's limits but are probably in the
 * wrong unit. Trade rules of thumb for bulk thermoelectrics near room
 * temperature: |S| from ~10 to ~1000 µV/K, σ from ~1 to ~1e5 S/cm, κ from ~0.1
 * to ~20 W/(m·K), carrier concentrations from ~1e16 to ~1e21 cm⁻³.
 */
type Range = { low: number; high: number; hint: (v: number) => string };

const engineRanges: Partial<Record<Quantity, Range>> = {
  seebeck: { low: 1e-6, high: 2e-3, hint: (v) => (Math.abs(v) < 1e-6 ? 'below 1 µV/K: was it written in V/K under a µV/K header?' : 'above 2000 µV/K: was it written in µV/K under a mV/K or V/K header?') },
  sigma: { low: 100, high: 1e7, hint: (v) => (v < 100 ? 'below 1 S/cm: is it a resistivity, or in S/m under an S/cm header?' : 'above 1e5 S/cm: metal-like; check the unit') },
  kappa: { low: 0.1, high: 20, hint: () => 'outside 0.1–20 W/(m·K): check the unit (W/(m·K), not mW/(cm·K))' },
  perCm3: { low: 1e16, high: 1e21, hint: () => 'outside 1e16–1e21 cm⁻³: is it in m⁻³ or in units of 1e18?' },
};

/** One warning per column: the first offending line and how many rows share the problem. */
export function magnitudeWarnings(rows: Array<{ line: number; record: string[] }>, columns: Array<Column & { index: number }>): UploadIssue[] {
  const out: UploadIssue[] = [];
  for (const c of columns) {
    const q: Quantity = c.quantity === 'resistivity' ? 'sigma' : c.quantity;
    const range = engineRanges[q];
    if (!range) continue;
    const bad = rows.flatMap((r) => {
      const v = parseCell(r.record[c.index] ?? '', ',');
      if (!v.ok) return [];
      const engine = c.convert(v.value);
      const size = q === 'seebeck' ? Math.abs(engine) : engine;
      return size > 0 && (size < range.low || size > range.high) ? [{ line: r.line, engine }] : [];
    });
    if (bad.length > 0) {
      const first = bad[0]!;
      out.push({ line: first.line, column: c.header, message: `suspicious magnitude${bad.length > 1 ? ` in ${bad.length} rows` : ''}: ${range.hint(first.engine)}` });
    }
  }
  return out;
}
