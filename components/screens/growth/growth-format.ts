import { formatNumber, formatScientific, withUnit } from '@/components/format/number';
import type { SheetZone } from '@/shared/api/growth-documents';

/** "0.875 mm": positions along the leg, from its cold end. */
export const mm = (value: number) => withUnit(formatNumber(value, 3), 'mm');

/** "2.47 × 10¹⁹ cm⁻³". */
export const perCm3 = (value: number) => withUnit(formatScientific(value, 3), 'cm⁻³');

/** "185 µV/K". */
export const microVoltPerK = (value: number) => withUnit(formatNumber(value, 3), 'µV/K');

/** "1230 S/cm". */
export const siemensPerCm = (value: number) => withUnit(formatNumber(value, 3), 'S/cm');

/** "84.4 K" (temperatures and temperature differences). */
export const kelvin = (value: number, digits = 3) => withUnit(formatNumber(value, digits), 'K');

/** "3.53 A". */
export const ampere = (value: number) => withUnit(formatNumber(value, 3), 'A');

/** A difference with its sign: "+1.2 K", "−2.76 K". */
export function signedKelvin(value: number): string {
  const size = formatNumber(Math.abs(value), 3);
  return withUnit(`${value < 0 ? '−' : '+'}${size}`, 'K');
}

/**
 * The doping band's edges in words. An edge that reached the design's
 * doping limit is marked: the tolerance goes at least that far, the model
 * was not asked beyond it.
 */
export function bandEdges(z: Pick<SheetZone, 'lowPerCm3' | 'highPerCm3' | 'lowAtBound' | 'highAtBound'>): { low: string; high: string } {
  const low = formatScientific(z.lowPerCm3, 3);
  const high = formatScientific(z.highPerCm3, 3);
  return { low: z.lowAtBound ? `≤ ${low} (bound)` : low, high: z.highAtBound ? `≥ ${high} (bound)` : high };
}

/** "1.89 × 10¹⁹ – 3.42 × 10¹⁹ cm⁻³", with bound marks. */
export function bandText(z: Pick<SheetZone, 'lowPerCm3' | 'highPerCm3' | 'lowAtBound' | 'highAtBound'>): string {
  const { low, high } = bandEdges(z);
  return withUnit(`${low} – ${high}`, 'cm⁻³');
}

/** A measured range "161–206 µV/K" (sorted, so it reads low to high for either carrier sign). */
export function rangeText(pair: readonly [number, number], unit: string): string {
  const [a, b] = [...pair].sort((x, y) => x - y);
  return withUnit(`${formatNumber(a, 3)}–${formatNumber(b, 3)}`, unit);
}

/** The zone's 1-based name as the grower reads it: "Zone 1" is at the cold end. */
export const zoneName = (index: number) => `Zone ${index + 1}`;
