import { markersAlong } from './leg-series';

describe('markersAlong', () => {
  it('spreads a baseline’s markers evenly, both ends included', () => {
    const line = Array.from({ length: 41 }, (_, i) => ({ x: i / 40, y: i }));
    expect(markersAlong(line).map((p) => p.y)).toEqual([0, 8, 16, 24, 32, 40]);
    expect(markersAlong(line.slice(0, 2))).toEqual(line.slice(0, 2));
    expect(markersAlong([])).toEqual([]);
  });
});
