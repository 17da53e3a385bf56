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

function superscript(exponent: number): string {
  return String(exponent)
    .split('')
    .map((c) => superscripts[c] ?? c)
    .join('');
}

/** "10¹⁹" for 19. */
export function powerOfTen(exponent: number): string {
  return `10${superscript(exponent)}`;
}

/** "1.2 × 10¹⁹" (3 significant digits unless told), "0" for zero, "–" for non-numbers. */
export function formatScientific(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '–';
  if (value === 0) return '0';
  const exponent = Math.floor(Math.log10(Math.abs(value)));
  const mantissa = Number((value / Math.pow(10, exponent)).toPrecision(digits));
  // Rounding can carry into the next decade (9.996 → 10.0).
  if (Math.abs(mantissa) >= 10) return formatScientific(Math.sign(value) * Math.pow(10, exponent + 1), digits);
  return `${mantissa} × 10${superscript(exponent)}`;
}

/** Plain numbers for the trade's usual magnitudes, scientific outside 0.01–99 999. */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '–';
  const size = Math.abs(value);
  if (value !== 0 && (size < 0.01 || size >= 1e5)) return formatScientific(value, digits);
  return String(Number(value.toPrecision(digits)));
}

/** A value with its unit, separated by a thin no-break space: "200 µV/K". */
export function withUnit(value: string, unit: string): string {
  return unit ? `${value}\u202f${unit}` : value;
}
