import { cascadeCurveSeries, curveLabel } from './cascade-curves';
import { cascadeResult } from './test-fixtures';

describe('cascade heat-load curves', () => {
  it('names each curve by how many of the coldest stages it lacks', () => {
    expect([3, 2, 1].map((n) => curveLabel(n, 3))).toEqual(['3 stages (this cascade)', '2 stages (coldest removed)', '1 stage (2 coldest removed)']);
  });

  it('leaves out points of no heat load (the log axis has no zero) and keeps mW while all are under a watt', () => {
    const r = cascadeResult();
    r.curves[0].points[0].heatLoad = 0;
    const { series, unit } = cascadeCurveSeries(r);
    expect(unit).toBe('mW');
    expect(series.map((s) => s.line.length)).toEqual([3, 4, 4]);
    expect(series[0].line.every((p) => p.y > 0)).toBe(true);
    expect(series[0].line[0]).toEqual({ x: r.curves[0].points[1].coldSide, y: r.curves[0].points[1].heatLoad * 1000 });
  });

  it('spans four decades below the largest load: a tail falling towards no load does not stretch the axis', () => {
    const r = cascadeResult();
    const largest = Math.max(...r.curves.flatMap((c) => c.points.map((p) => p.heatLoad)));
    r.curves[1].points[0].heatLoad = largest * 1e-10;
    r.curves[1].points[1].heatLoad = largest * 2e-4;
    const { series } = cascadeCurveSeries(r);
    expect(series[1].line.map((p) => p.y / 1000)).toEqual(r.curves[1].points.slice(1).map((p) => p.heatLoad));
  });
});
