import { formatLogTick, formatTick } from '@/components/format/number';
import { logTicks, mergeSeries } from './series-data';
import type { PlotSeries } from './series-plot-types';

const mark = { color: '#000000', dash: 'solid', marker: 'circle' } as const;

describe('series data', () => {
  it('merges lines and points of several series into rows sorted by x', () => {
    const series: PlotSeries[] = [
      { key: 'a', label: 'a', mark, line: [{ x: 1e19, y: 10 }, { x: 1e20, y: 100 }], points: [{ x: 3e19, y: 30 }] },
      { key: 'b', label: 'b', mark, line: [{ x: 1e19, y: 1 }, { x: 1e21, y: -5 }] },
    ];
    const rows = mergeSeries(series, 'log', 'log');
    // 1e21 carries only a negative value, which has no logarithm: left out rather than drawn wrong.
    expect(rows.map((r) => r.x)).toEqual([19, expect.closeTo(Math.log10(3e19), 12), 20]);
    expect(rows[0]).toEqual({ x: 19, l0: 1, p0: null, l1: 0, p1: null });
    expect(rows[1]).toMatchObject({ l0: null, p0: expect.closeTo(Math.log10(30), 12), l1: null });
    expect(rows[2]).toEqual({ x: 20, l0: 2, p0: null, l1: null, p1: null });
    expect(mergeSeries(series, 'linear', 'linear')[0]).toEqual({ x: 1e19, l0: 10, p0: null, l1: 1, p1: null });
  });

  it('puts log ticks on 1-2-5 over short ranges and on decades over long ones', () => {
    expect(logTicks([Math.log10(5e18), 20]).map(formatLogTick)).toEqual(['5 × 10¹⁸', '10¹⁹', '2 × 10¹⁹', '5 × 10¹⁹', '10²⁰']);
    expect(logTicks([17, 21]).map(formatLogTick)).toEqual(['10¹⁷', '10¹⁸', '10¹⁹', '10²⁰', '10²¹']);
    expect(logTicks([Math.log10(1.2e19), Math.log10(1.8e19)]).map(formatLogTick)).toEqual(['1.2 × 10¹⁹', '1.8 × 10¹⁹']);
    expect(logTicks([])).toEqual([]);
  });

  it('writes linear ticks as the screens write numbers, without float noise', () => {
    expect(formatTick(0.30000000000000004)).toBe('0.3');
    expect(formatTick(1500)).toBe('1500');
    // The chart font has no superscript minus: a plain one stands in.
    expect(formatTick(2.5e-5)).toBe('2.5 × 10-⁵');
    expect(formatTick(2e19)).toBe('2 × 10¹⁹');
    expect(formatTick(0)).toBe('0');
  });
});
