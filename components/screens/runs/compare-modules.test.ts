import { moduleDesign, moduleSummary } from '@/components/screens/modules/module-fixtures';
import { comparedModules, moduleCompareRows, moduleCompareSeries } from './compare-modules';

const idA = 'aaaaaaaa-aaaa-4aaa-8aaa-aaaaaaaaaaaa';
const idB = 'bbbbbbbb-bbbb-4bbb-8bbb-bbbbbbbbbbbb';

describe('module comparison', () => {
  it('scales with the number of identical couples in series: N× Qc and voltage, same current and COP', () => {
    // A rule of the trade (any thermoelectrics handbook): N identical couples
    // electrically in series and thermally in parallel carry one current.
    const [one, many] = comparedModules([moduleDesign(idA, 'One couple', 1), moduleDesign(idB, 'Stage module', 31)]);
    if (!one.curve || !many.curve) throw new Error(`no curve: ${one.problem ?? many.problem}`);
    expect(many.curve.maxHeatLoad.heatLoad / one.curve.maxHeatLoad.heatLoad).toBeCloseTo(31, 6);
    expect(many.curve.maxHeatLoad.voltage / one.curve.maxHeatLoad.voltage).toBeCloseTo(31, 6);
    expect(many.curve.maxHeatLoad.current).toBeCloseTo(one.curve.maxHeatLoad.current, 6);
    expect(many.curve.maxCop?.cop ?? NaN).toBeCloseTo(one.curve.maxCop?.cop ?? NaN, 6);
    // COP peaks below the current of the largest heat load (A. F. Ioffe, Semiconductor Thermoelements, 1957).
    expect(one.curve.maxCop?.current ?? Infinity).toBeLessThan(one.curve.maxHeatLoad.current);
  });

  it('lists every module’s numbers with units, and leg sources by name', () => {
    const list = comparedModules([moduleDesign(idA, 'One couple', 1), moduleDesign(idB, 'Stage module', 31, { currentLimit: 0.5 })]);
    const rows = moduleCompareRows(list, list.map((m) => moduleSummary(m.module)));
    const row = (key: string) => rows.find((r) => r.key === key)?.cells ?? [];
    expect(row('couples')).toEqual(['1', '31']);
    expect(row('maxQc')[1]).toMatch(/^[\d.]+\s?W at [\d.]+\s?A$/);
    expect(row('n')[0]).toBe('NL-N3 n-type band model at 2 × 10¹⁹\u202fcm⁻³, 1.5\u202fmm × 1\u202fmm²');
    expect(row('p')[0]).toBe('Stage-2 leg, optimum leg of a run');
    expect(row('limit')).toEqual(['none', expect.stringMatching(/^0\.5\s?A, maximum-Qc current over it$/)]);
    expect(moduleCompareSeries(list, 'cop')).toHaveLength(2);
  });

  it('says why a module has no curves instead of dropping it', () => {
    const bad = moduleDesign(idA, 'Too hot', 1, { deltaT: 400 });
    const [m] = comparedModules([bad]);
    expect(m.curve).toBeNull();
    expect(moduleCompareRows([m]).find((r) => r.key === 'problem')?.cells[0]).toMatch(/\S/);
    expect(moduleCompareSeries([m], 'heatLoad')).toEqual([]);
  });

  it('computes a fetched module once, and again when the module changes', () => {
    const saved = moduleDesign(idA, 'Stage', 4);
    const [first] = comparedModules([saved]);
    const [again] = comparedModules([saved]);
    expect(again.curve).toBe(first.curve);
    const edited = { ...saved, case: { ...saved.case, couples: 8 } };
    const [changed] = comparedModules([edited]);
    expect(changed.curve).not.toBe(first.curve);
    expect(changed.curve!.maxHeatLoad.heatLoad / first.curve!.maxHeatLoad.heatLoad).toBeCloseTo(2, 6);
  });
});
