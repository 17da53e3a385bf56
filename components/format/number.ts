const superscripts: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/**
 * Superscript digits; the minus is the superscript minus unless told
 * otherwise — the chart font (IBM Plex Mono) has superscript digits but no
 * superscript minus, so chart ticks ask for a plain one.
 */
function superscript(exponent: number, minus = '⁻'): string {
  return String(exponent)
    .split('')
    .map((c) => (c === '-' ? minus : superscripts[c] ?? c))
    .join('');
}

export type ScientificGlyphs = { minus?: string };

/** "10¹⁹" for 19. */
export function powerOfTen(exponent: number): string {
  return `10${superscript(exponent)}`;
}

/** "1.2 × 10¹⁹" (3 significant digits unless told), "0" for zero, "–" for non-numbers. */
export function formatScientific(value: number, digits = 3, glyphs: ScientificGlyphs = {}): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const mantissa = Number((value / Math.pow(10, exponent)).toPrecision(digits));
  // Rounding can carry into the next decade (9.996 → 10.0).
  if (Math.abs(mantissa) >= 10) return formatScientific(Math.sign(value) * Math.pow(10, exponent + 1), digits, glyphs);
  return `${mantissa} × 10${superscript(exponent, glyphs.minus)}`;
}

/** Plain numbers for the trade's usual magnitudes, scientific outside 0.01–99 999. */
export function formatNumber(value: number, digits = 3, glyphs: ScientificGlyphs = {}): string {
  if (!Number.isFinite(value)) return '–';
  // Judge the magnitude after rounding: 99 999 at 3 digits is 1 × 10⁵, not "100000".
  const rounded = Number(value.toPrecision(digits));
  const size = Math.abs(rounded);
  if (rounded !== 0 && (size < 0.01 || size >= 1e5)) return formatScientific(value, digits, glyphs);
  // `+ 0` turns a rounded -0 into 0.
  return String(rounded + 0);
}

/** The chart font's glyphs (see `superscript`). */
const chartGlyphs: ScientificGlyphs = { minus: '-' };

/** A linear chart axis tick: the screens' notation ("2 × 10¹⁹", "0.35"), short and without float noise. */
export function formatTick(value: number): string {
  return formatNumber(value, 3, chartGlyphs);
}

/** A log chart axis tick at log10 value `v`: "10¹⁹", "2 × 10¹⁹", "3.5 × 10²⁰". */
export function formatLogTick(v: number): string {
  if (!Number.isFinite(v)) return '–';
  const text = formatScientific(Math.pow(10, v), 2, chartGlyphs);
  // A decade tick reads as the power alone.
  return text.startsWith('1 × ') ? text.slice(4) : text;
}

/**
 * A stored number as the text of an input the user may edit and save
 * again: exact, and in the notation Number() reads back ("2e19", not
 * "20000000000000000000"; "2.5e-7", not "2.5 × 10⁻⁷"). Blank for none.
 */
export function formatForInput(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  const size = Math.abs(value);
  if (value !== 0 && (size < 1e-4 || size >= 1e5)) return value.toExponential().replace('e+', 'e');
  return String(value);
}

/** A value with its unit, separated by a thin no-break space: "200 µV/K". */
export function withUnit(value: string, unit: string): string {
  return unit ? `${value}\u202f${unit}` : value;
}
