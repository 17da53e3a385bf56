import { runModule, parseModuleCase } from '@/shared/engine';
import { moduleCase } from './module-fixtures';
import { modulePlots } from './module-series';

describe('module plot legends', () => {
  it('name each series once, without "the current at the current"', () => {
    const plots = modulePlots(runModule(parseModuleCase(moduleCase())));
    const labels = plots.flatMap((p) => p.series.map((s) => s.label));
    expect(labels).toContain('Current of maximum Qc');
    expect(labels).toContain('Maximum Qc at each ΔT');
    for (const label of labels) expect(label).not.toMatch(/\b(\w+)\b.*\bat the \1\b/i);
  });
});
