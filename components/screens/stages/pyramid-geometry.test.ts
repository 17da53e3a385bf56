import { pyramidBars, sharedScale } from './pyramid-geometry';

const stages = [
  { couples: 4, coldSide: 203, hotSide: 231 },
  { couples: 12, coldSide: 231, hotSide: 262 },
  { couples: 36, coldSide: 262, hotSide: 300 },
];

describe('pyramidBars', () => {
  it('draws widths in proportion to the couple counts, the largest stage filling the width, coldest first', () => {
    const bars = pyramidBars(stages);
    expect(bars.map((b) => b.number)).toEqual([1, 2, 3]);
    expect(bars.map((b) => b.widthShare)).toEqual([4 / 36, 12 / 36, 1]);
    // To scale: the ratio of two widths is the ratio of their counts.
    expect(bars[1]!.widthShare / bars[0]!.widthShare).toBeCloseTo(3, 12);
  });

  it('puts pyramids side by side on one scale', () => {
    const small = [{ couples: 6, coldSide: 220, hotSide: 260 }, { couples: 18, coldSide: 260, hotSide: 300 }];
    const scale = sharedScale([stages, small]);
    expect(scale).toBe(36);
    expect(pyramidBars(small, scale).map((b) => b.widthShare)).toEqual([6 / 36, 18 / 36]);
  });

  it('draws nothing for a stage with no couples rather than dividing by zero', () => {
    expect(pyramidBars([{ couples: 0, coldSide: 250, hotSide: 300 }])[0]!.widthShare).toBe(0);
  });
});
