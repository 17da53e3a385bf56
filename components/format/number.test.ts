import { formatForInput, formatLogTick, formatNumber, formatScientific, formatTick, withUnit } from './number';

describe('number formatting', () => {
  it('writes powers of ten with superscripts and rounds the mantissa', () => {
    expect(formatScientific(1.23456e19)).toBe('1.23 × 10¹⁹');
    expect(formatScientific(2e-4, 2)).toBe('2 × 10⁻⁴');
    expect(formatScientific(9.9996e18)).toBe('1 × 10¹⁹');
    expect(formatScientific(-3.5e20, 2)).toBe('-3.5 × 10²⁰');
    expect(formatScientific(Number.NaN)).toBe('–');
  });

  it('keeps everyday magnitudes plain', () => {
    expect(formatNumber(350)).toBe('350');
    expect(formatNumber(1.4913)).toBe('1.49');
    expect(formatNumber(-1.5)).toBe('-1.5');
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(123456)).toBe('1.23 × 10⁵');
    expect(formatNumber(0.0021)).toBe('2.1 × 10⁻³');
  });

  it('copes with the edge cases: zero, negatives, doping magnitudes, small numbers and non-numbers', () => {
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(-0.0000001 * 0)).toBe('0');
    expect(formatNumber(-42.345)).toBe('-42.3');
    expect(formatNumber(-2e19)).toBe('-2 × 10¹⁹');
    expect(formatNumber(1e19)).toBe('1 × 10¹⁹');
    expect(formatNumber(1.6e19)).toBe('1.6 × 10¹⁹');
    expect(formatNumber(0.001)).toBe('1 × 10⁻³');
    expect(formatNumber(0.01)).toBe('0.01');
    expect(formatNumber(99999)).toBe('1 × 10⁵');
    expect(formatNumber(Number.NaN)).toBe('–');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('–');
  });

  it('writes chart ticks in the same notation as the text beside the chart', () => {
    expect(formatTick(1.6e19)).toBe(formatNumber(1.6e19));
    expect(formatTick(-3)).toBe('-3');
    expect(formatTick(Number.NaN)).toBe('–');
    expect(formatLogTick(19)).toBe('10¹⁹');
    expect(formatLogTick(Math.log10(2e19))).toBe('2 × 10¹⁹');
    expect(formatLogTick(Math.log10(0.001))).toBe('10-³');
    expect(formatLogTick(Number.NaN)).toBe('–');
  });

  it('writes a stored number back into an input exactly, in a notation the input reads back', () => {
    expect(formatForInput(2e19)).toBe('2e19');
    expect(formatForInput(1.6e19)).toBe('1.6e19');
    expect(formatForInput(2.5e-7)).toBe('2.5e-7');
    expect(formatForInput(-3e20)).toBe('-3e20');
    expect(formatForInput(1.5)).toBe('1.5');
    expect(formatForInput(0)).toBe('0');
    expect(formatForInput(0.001)).toBe('0.001');
    expect(formatForInput(0.0001)).toBe('0.0001');
    expect(formatForInput(null)).toBe('');
    expect(formatForInput(Number.NaN)).toBe('');
    for (const v of [2e19, 1.234567891e-9, 12345678, 0.30000000000000004]) expect(Number(formatForInput(v))).toBe(v);
  });

  it('joins a unit with a narrow no-break space', () => {
    expect(withUnit('200', 'µV/K')).toBe('200\u202fµV/K');
    expect(withUnit('0.8', '')).toBe('0.8');
  });
});
