import { formatNumber, formatScientific, withUnit } from './number';

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

  it('joins a unit with a narrow no-break space', () => {
    expect(withUnit('200', 'µV/K')).toBe('200\u202fµV/K');
    expect(withUnit('0.8', '')).toBe('0.8');
  });
});
