import { design } from '../runs/test-fixtures';
import { checkSweep, parseValueList } from './sweep-model';

describe('sweep values', () => {
  it('reads commas, spaces, semicolons and powers of ten', () => {
    expect(parseValueList('280, 290 300;310')).toEqual([280, 290, 300, 310]);
    expect(parseValueList('5e19, 1×10^20')).toEqual([5e19, 1e20]);
  });

  it('accepts a list the design allows at every value', () => {
    expect(checkSweep(design(), 'hotSide', '280, 290, 300, 310')).toEqual({ ok: true, request: { parameter: 'hotSide', values: [280, 290, 300, 310] } });
  });

  it('refuses what would launch runs bound to fail, naming the value', () => {
    expect(checkSweep(design(), 'hotSide', '300')).toEqual({ ok: false, message: 'a sweep needs at least 2 values' });
    expect(checkSweep(design(), 'hotSide', '300, abc')).toEqual({ ok: false, message: 'Not a number: abc' });
    expect(checkSweep(design(), 'hotSide', '300, 300')).toMatchObject({ ok: false, message: expect.stringMatching(/^Each value once/) });
    expect(checkSweep(design(), 'hotSide', '300, 1500')).toMatchObject({ ok: false, message: expect.stringMatching(/^At 1500\sK: Hot-side temperature Th above 1000 K/) });
    // A lower bound above the design's upper bound.
    expect(checkSweep(design(), 'minPerCm3', '1e18, 2e20')).toMatchObject({ ok: false, message: expect.stringMatching(/^At 2 × 10²⁰\scm⁻³: Highest doping must be greater than Lowest doping/) });
  });
});
